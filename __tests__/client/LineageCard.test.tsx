import { screen } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { KitSetupList } from '../../components/KitSetupList';
import { LineageCard } from '../../components/LineageCard';
import { SyncBanner } from '../../components/SyncBanner';
import type { SetupDetail } from '../../shared/types/setups';
import { renderThemed } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

function setupDetail(overrides: Partial<SetupDetail> = {}): SetupDetail {
  return {
    id: 31, title: 'Hollow Pines, my first try', visibility: 'unlisted', shareToken: 'tok', isOwner: false,
    owner: { handle: 'rafi_new', displayName: 'Rafi' },
    car: { id: 12, nickname: 'First Stoat', kitName: 'Stoat 8E', makerName: 'Ottervale Kitworks', stock: true },
    vehicleClass: 'buggy-1-8-electric', templateVersion: 1,
    conditions: { trackType: null, temperatureC: null, grip: null }, notesMarkdown: '', notesHtml: '',
    currentRevision: { id: 90, number: 3, values: {}, changeNote: 'Softer front.', createdAt: '2026-12-01T10:00:00.000Z' },
    revisions: [], photos: [],
    lineage: { forkedFrom: { available: true, setupId: 7, title: 'Hollow Pines — loose and dusty', ownerHandle: 'juno_braithwick', revisionNumber: 4, share: null }, forkCount: 0, familyForkCount: 3 },
    commentCount: 2, hidden: null, createdAt: '2026-11-30T10:00:00.000Z', updatedAt: '2026-12-01T10:00:00.000Z',
    ...overrides,
  };
}

const hrefOf = (name: string) => screen.getByRole('link', { name }).props.href as string;

describe('forks and history on the setup page', () => {
  it('links the original it was forked from, the family, the history and the comparison, carrying the share code', () => {
    renderThemed(<LineageCard setup={setupDetail()} share="tok" signedIn signInHref="/sign-in" />);
    expect(hrefOf('Fork this setup')).toBe('/setups/31/fork?share=tok');
    expect(hrefOf('Forked from “Hollow Pines — loose and dusty” by @juno_braithwick (revision 4)')).toBe('/setups/7');
    expect(hrefOf('Compare with the original')).toBe('/compare?a=7&b=31&bs=tok');
    expect(screen.getByText('0 forks · 3 forks in the whole family')).toBeTruthy();
    expect(hrefOf('See the family')).toBe('/setups/31/family?share=tok');
    expect(hrefOf('History of changes')).toBe('/setups/31/history?share=tok');
    expect(hrefOf('Compare revision 3 with revision 2')).toBe('/compare?a=31&ar=2&b=31&br=3&as=tok&bs=tok');
    expect(screen.getByText('2 comments')).toBeTruthy();
  });

  it('says when the original is gone, and asks signed-out readers to sign in before forking', () => {
    const setup = setupDetail({ lineage: { forkedFrom: { available: false }, forkCount: 1, familyForkCount: 1 }, currentRevision: { id: 80, number: 1, values: {}, changeNote: '', createdAt: '2026-12-01T10:00:00.000Z' } });
    renderThemed(<LineageCard setup={setup} signedIn={false} signInHref="/sign-in?next=%2Fsetups%2F31%2Ffork" />);
    expect(screen.getByText('Original no longer available')).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Fork this setup' })).toBeNull();
    expect(hrefOf('Sign in to fork this setup')).toBe('/sign-in?next=%2Fsetups%2F31%2Ffork');
    // A first revision has nothing before it to compare with.
    expect(screen.queryByRole('link', { name: /^Compare/ })).toBeNull();
  });

  it('links an unlisted original with the share code its fork owner was given', () => {
    const lineage = { forkedFrom: { available: true as const, setupId: 7, title: 'Quiet one', ownerHandle: 'juno_braithwick', revisionNumber: 2, share: 's3cret' }, forkCount: 0, familyForkCount: 1 };
    renderThemed(<LineageCard setup={setupDetail({ lineage })} signedIn signInHref="/sign-in" />);
    expect(hrefOf('Forked from “Quiet one” by @juno_braithwick (revision 2)')).toBe('/setups/7?share=s3cret');
    expect(hrefOf('Compare with the original')).toBe('/compare?a=7&b=31&as=s3cret');
  });

  it('tells the fork’s owner how many fields the original changed, linking to the review', () => {
    renderThemed(<SyncBanner setupId={31} count={4} />);
    expect(screen.getByText('The original changed 4 fields since you forked it')).toBeTruthy();
    expect(hrefOf('Review the changes')).toBe('/setups/31/sync');
  });

  it('counts from the last time the fork took changes once it has', () => {
    renderThemed(<SyncBanner setupId={31} count={1} sinceFork={false} />);
    expect(screen.getByText('The original changed 1 field since you last took changes')).toBeTruthy();
  });
});

describe('public setups of a kit', () => {
  it('lists each with its owner, track, revisions and forks, linking to the setup', () => {
    const setups = [
      { id: 7, title: 'Hollow Pines — loose and dusty', ownerHandle: 'juno_braithwick', revisionCount: 4, forkCount: 2, trackType: 'loose-dusty', updatedAt: '2026-11-29T10:00:00.000Z' },
      { id: 8, title: 'Any-track base', ownerHandle: 'pell-strand', revisionCount: 1, forkCount: 1, trackType: null, updatedAt: '2026-11-20T10:00:00.000Z' },
    ];
    renderThemed(<KitSetupList setups={setups} />);
    expect(screen.getByText(/^@juno_braithwick · Loose and dusty · 4 revisions · 2 forks · changed /)).toBeTruthy();
    expect(screen.getByText(/^@pell-strand · Any track · 1 revision · 1 fork · changed /)).toBeTruthy();
    expect(screen.getAllByRole('link').map((l) => l.props.href)).toEqual(['/setups/7', '/setups/8']);
  });
});
