import { act, screen, waitFor } from '@testing-library/react-native';
import type { ReactElement } from 'react';
import { Text } from 'react-native';
import { NotificationBell, notificationBellLabel, unreadBadgeText } from '../../components/NotificationBell';
import { UNREAD_POLL_MS, useUnreadCountQuery } from '../../hooks/notifications';
import { renderThemed, renderWithQueries, stubFetch } from './support/render';

jest.mock('expo-router', () => ({
  Link: ({ children, href }: { children: ReactElement; href: string }) => jest.requireActual('react').cloneElement(children, { href }),
}));

describe('the notifications bell', () => {
  it('says how many are unread, for screen readers and on its badge', () => {
    renderThemed(<NotificationBell unreadCount={3} orientation="bar" />);
    const bell = screen.getByRole('link', { name: 'Notifications, 3 unread' });
    expect(bell.props.href).toBe('/notifications');
    // The badge is for the eye; screen readers hear the count in the label.
    expect(screen.getByText('3', { includeHiddenElements: true })).toBeTruthy();
  });

  it('shows no badge and says only "Notifications" when nothing is unread or the count is not known yet', () => {
    const { rerender } = renderThemed(<NotificationBell unreadCount={0} orientation="rail" />);
    expect(screen.getByRole('link', { name: 'Notifications' })).toBeTruthy();
    expect(screen.queryByText('0', { includeHiddenElements: true })).toBeNull();
    rerender(<NotificationBell unreadCount={null} orientation="bar" />);
    expect(screen.getByRole('link', { name: 'Notifications' })).toBeTruthy();
  });

  it('keeps the badge to two digits but says the whole number', () => {
    expect(notificationBellLabel(150)).toBe('Notifications, 150 unread');
    expect(unreadBadgeText(150)).toBe('99+');
    expect(unreadBadgeText(99)).toBe('99');
    renderThemed(<NotificationBell unreadCount={150} orientation="bar" />);
    expect(screen.getByText('99+', { includeHiddenElements: true })).toBeTruthy();
  });
});

function Count() {
  const unread = useUnreadCountQuery(true);
  return <Text>{unread.data === undefined ? 'unknown' : `count ${unread.data}`}</Text>;
}

describe('the unread count', () => {
  afterEach(() => {
    jest.useRealTimers();
  });

  it('asks the server again every minute while the app is on screen', async () => {
    jest.useFakeTimers();
    let unread = 2;
    const { calls } = stubFetch(() => ({ status: 200, body: { unreadCount: unread } }));
    renderWithQueries(<Count />);
    await waitFor(() => expect(screen.getByText('count 2')).toBeTruthy());
    expect(calls.map((c) => c.url)).toEqual(['/api/notifications/unread-count']);
    unread = 5;
    await act(async () => {
      jest.advanceTimersByTime(UNREAD_POLL_MS - 1_000);
    });
    expect(calls).toHaveLength(1);
    await act(async () => {
      jest.advanceTimersByTime(1_000);
    });
    await waitFor(() => expect(screen.getByText('count 5')).toBeTruthy());
    expect(calls).toHaveLength(2);
  });
});
