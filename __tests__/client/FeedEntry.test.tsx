import { screen } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { FeedEntry } from '../../components/FeedEntry';
import type { FeedItem } from '../../shared/types/community';
import { renderThemed } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

const NOW = Date.parse('2026-12-02T12:00:00.000Z');
const juno = { handle: 'juno_braithwick', displayName: 'Juno Braithwick' };
const hrefOf = (name: string) => screen.getByRole('link', { name }).props.href as string;

describe('an activity feed entry', () => {
  it('shows a revision with its change note, linking the racer, the setup and what the change changed', () => {
    const item: FeedItem = {
      kind: 'revision',
      id: 91,
      createdAt: '2026-12-02T09:00:00.000Z',
      actor: juno,
      setup: { id: 7, title: 'Hollow Pines — loose and dusty', vehicleClass: 'buggy-1-8-electric' },
      revision: { number: 4, changeNote: 'Thicker rear oil for the ruts after the rain.' },
    };
    renderThemed(<FeedEntry item={item} now={NOW} />);
    expect(hrefOf('@juno_braithwick')).toBe('/racers/juno_braithwick');
    expect(screen.getByText('saved revision 4 of a setup')).toBeTruthy();
    expect(hrefOf('Hollow Pines — loose and dusty')).toBe('/setups/7');
    expect(screen.getByText('Thicker rear oil for the ruts after the rain.')).toBeTruthy();
    expect(hrefOf('What changed in revision 4')).toBe('/compare?a=7&ar=3&b=7&br=4');
    expect(screen.getByText('1/8 electric buggy · 3 h ago')).toBeTruthy();
  });

  it('shows a fork of my setup with links to my original and to the fork', () => {
    const item: FeedItem = {
      kind: 'fork',
      id: 120,
      createdAt: '2026-11-30T09:00:00.000Z',
      actor: { handle: 'rafi_new', displayName: 'Rafi' },
      setup: { id: 120, title: 'Hollow Pines, my first try', vehicleClass: 'buggy-1-8-electric' },
      original: { id: 7, title: 'Hollow Pines — loose and dusty' },
    };
    renderThemed(<FeedEntry item={item} now={NOW} />);
    expect(screen.getByText('forked your setup')).toBeTruthy();
    expect(hrefOf('Hollow Pines — loose and dusty')).toBe('/setups/7');
    expect(hrefOf('Hollow Pines, my first try')).toBe('/setups/120');
    expect(screen.queryByRole('link', { name: /What changed/ })).toBeNull();
  });

  it('shows a new setup', () => {
    const item: FeedItem = { kind: 'setup', id: 8, createdAt: '2026-12-02T11:59:30.000Z', actor: juno, setup: { id: 8, title: 'Saltmarsh — wet grass', vehicleClass: 'truggy-1-8-nitro' } };
    renderThemed(<FeedEntry item={item} now={NOW} />);
    expect(screen.getByText('published a new setup')).toBeTruthy();
    expect(screen.getByText('1/8 nitro truggy · just now')).toBeTruthy();
    expect(hrefOf('Saltmarsh — wet grass')).toBe('/setups/8');
  });
});
