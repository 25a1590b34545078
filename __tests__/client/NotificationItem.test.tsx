import { fireEvent, screen } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { NotificationItem, notificationHref, notificationText } from '../../components/NotificationItem';
import type { NotificationDto } from '../../shared/types/community';
import { renderThemed } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href, onPress }: { children: ReactElement; href: string; onPress?: () => void }) =>
    jest.requireActual('react').cloneElement(children, { href, onPress }),
}));

const NOW = Date.parse('2026-12-02T12:00:00.000Z');

function notification(overrides: Partial<NotificationDto> = {}): NotificationDto {
  return {
    id: 5, type: 'comment-on-setup', createdAt: '2026-12-02T11:50:00.000Z', read: false,
    actor: { handle: 'rafi_new', displayName: 'Rafi' }, setup: { id: 7, title: 'Hollow Pines — loose and dusty', available: true },
    revision: null, commentId: 40, detail: 'Which tyres on the dusty line?',
    ...overrides,
  };
}

describe('a notification', () => {
  it('says what happened, opens the setup and is marked read when opened', () => {
    const onMarkRead = jest.fn();
    renderThemed(<NotificationItem notification={notification()} now={NOW} onMarkRead={onMarkRead} />);
    const open = screen.getByRole('link', { name: 'Unread: @rafi_new commented on “Hollow Pines — loose and dusty”' });
    expect(open.props.href).toBe('/setups/7');
    expect(screen.getByText('Which tyres on the dusty line?')).toBeTruthy();
    expect(screen.getByText('10 min ago')).toBeTruthy();
    fireEvent.press(open);
    expect(onMarkRead).toHaveBeenCalledWith(5);
  });

  it('offers "Mark read" while unread, and nothing once read', () => {
    const onMarkRead = jest.fn();
    const { rerender } = renderThemed(<NotificationItem notification={notification()} now={NOW} onMarkRead={onMarkRead} />);
    fireEvent.press(screen.getByRole('button', { name: 'Mark read: @rafi_new commented on “Hollow Pines — loose and dusty”' }));
    expect(onMarkRead).toHaveBeenCalledWith(5);
    rerender(<NotificationItem notification={notification({ read: true })} now={NOW} onMarkRead={onMarkRead} />);
    expect(screen.queryByRole('button', { name: /Mark read/ })).toBeNull();
    expect(screen.getByRole('link', { name: '@rafi_new commented on “Hollow Pines — loose and dusty”' })).toBeTruthy();
  });

  it('words each event and links where it can be acted on', () => {
    const cases: Array<[Partial<NotificationDto>, string, string | null]> = [
      [{ type: 'new-follower', setup: null }, '@rafi_new started following you', '/racers/rafi_new'],
      [{ type: 'comment-on-revision', revision: { id: 91, number: 4, setupId: 7 } }, '@rafi_new commented on your change to “Hollow Pines — loose and dusty” (revision 4)', '/setups/7/history'],
      [{ type: 'comment-reply' }, '@rafi_new replied to your comment on “Hollow Pines — loose and dusty”', '/setups/7'],
      [{ type: 'setup-forked' }, '@rafi_new forked “Hollow Pines — loose and dusty”', '/setups/7/family'],
      [{ type: 'original-changed', setup: { id: 31, title: 'My fork', available: true }, revision: { id: 95, number: 5, setupId: 7 } }, '@rafi_new changed the original of your fork “My fork” (revision 5)', '/setups/31/sync'],
      [{ type: 'report-outcome', actor: null, setup: null }, 'Your report was reviewed', '/reports'],
      [{ type: 'moderation-notice', actor: null }, 'The moderators acted on “Hollow Pines — loose and dusty”', '/moderation/mine'],
      [{ type: 'moderation-notice', actor: null, setup: null }, 'The moderators made a decision about your account or posts', '/moderation/mine'],
      [{ type: 'comment-on-setup', setup: { id: 7, title: null, available: false } }, '@rafi_new commented on a setup you can no longer open', null],
    ];
    for (const [overrides, text, href] of cases) {
      const n = notification(overrides);
      expect(notificationText(n)).toBe(text);
      expect(notificationHref(n)).toBe(href);
    }
  });

  it('shows a notification about a setup I can no longer open without a link', () => {
    renderThemed(<NotificationItem notification={notification({ read: true, setup: { id: 7, title: null, available: false } })} now={NOW} onMarkRead={jest.fn()} />);
    expect(screen.queryByRole('link')).toBeNull();
    expect(screen.getByText('@rafi_new commented on a setup you can no longer open')).toBeTruthy();
  });
});
