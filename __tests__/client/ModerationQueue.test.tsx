import { fireEvent, screen, waitFor, within } from '@testing-library/react-native';
import ModerationQueueScreen from '../../app/moderation/index';
import { AppealDecisionForm } from '../../components/AppealDecisionForm';
import { QueueActions } from '../../components/QueueActions';
import { rememberCsrfToken } from '../../hooks/api';
import type { Me } from '../../shared/types/auth';
import type { QueueItem } from '../../shared/types/moderation';
import { queueItemFixture } from './support/moderationFixtures';
import { renderThemed, renderWithQueries, stubFetch } from './support/render';
import { signedInJuno } from './support/historyFixtures';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: unknown }) => children,
  Redirect: () => null,
  router: { push: jest.fn(), replace: jest.fn() },
}));

function renderActions(item: QueueItem = queueItemFixture()) {
  const onAct = jest.fn(() => Promise.resolve());
  renderThemed(<QueueActions item={item} onAct={onAct} />);
  return onAct;
}

describe('QueueActions', () => {
  it('hides spam in two taps with the reason filled in', async () => {
    const onAct = renderActions();
    fireEvent.press(screen.getByRole('button', { name: 'Hide as spam: CHEAP TYRES — best grip deals' }));
    expect(screen.getByLabelText('Reason (the author sees it)').props.value).toBe('Spam or advertising.');
    fireEvent.press(screen.getByRole('button', { name: 'Hide it' }));
    await waitFor(() => expect(onAct).toHaveBeenCalledWith({ targetType: 'setup', targetId: 41, action: 'hide', reason: 'Spam or advertising.' }));
  });

  it('suspends for the chosen length, hiding the posts when asked, with the edited reason', async () => {
    const onAct = renderActions();
    fireEvent.press(screen.getByRole('radio', { name: 'Suspend author' }));
    fireEvent.press(screen.getByRole('radio', { name: '30 days' }));
    fireEvent.press(screen.getByRole('checkbox', { name: 'Also hide everything they posted' }));
    fireEvent.changeText(screen.getByLabelText('Reason (the author sees it)'), 'Advertising in every post.');
    fireEvent.press(screen.getByRole('button', { name: 'Suspend @spoke_deals' }));
    await waitFor(() =>
      expect(onAct).toHaveBeenCalledWith({
        targetType: 'setup', targetId: 41, action: 'suspend', reason: 'Advertising in every post.', suspendDays: 30, hideContent: true,
      }),
    );
  });

  it('suspends until lifted as suspendDays null', async () => {
    const onAct = renderActions();
    fireEvent.press(screen.getByRole('radio', { name: 'Suspend author' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Until lifted' }));
    fireEvent.press(screen.getByRole('button', { name: 'Suspend @spoke_deals' }));
    await waitFor(() => expect(onAct).toHaveBeenCalledWith(expect.objectContaining({ action: 'suspend', suspendDays: null, hideContent: false })));
  });

  it('will not warn without a reason', async () => {
    const onAct = renderActions();
    fireEvent.press(screen.getByRole('radio', { name: 'Warn author' }));
    fireEvent.press(screen.getByRole('button', { name: 'Warn @spoke_deals' }));
    expect(await screen.findByText('Give a reason; the author will see it.')).toBeTruthy();
    expect(onAct).not.toHaveBeenCalled();
  });

  it('offers restore instead of hide for content a moderator hid, and no spam shortcut', () => {
    renderActions(queueItemFixture({ content: { ...queueItemFixture().content, hiddenAt: '2026-12-01T10:00:00.000Z', hiddenReason: 'Spam.' } }));
    expect(screen.getByRole('radio', { name: 'Restore' })).toBeTruthy();
    expect(screen.queryByRole('radio', { name: 'Hide' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Hide as spam/ })).toBeNull();
  });

  it('lets a moderator confirm or undo an automatic hide', () => {
    renderActions(queueItemFixture({ content: { ...queueItemFixture().content, hiddenAt: '2026-12-01T10:00:00.000Z', autoHidden: true } }));
    expect(screen.getByRole('radio', { name: 'Restore' })).toBeTruthy();
    expect(screen.getByRole('radio', { name: 'Hide' })).toBeTruthy();
    expect(screen.getByRole('button', { name: /Hide as spam/ })).toBeTruthy();
  });

  it('says why a moderator may not act, with no actions', () => {
    renderActions(queueItemFixture({ canAct: false, cannotActReason: 'This is your own post; another moderator must act on it.' }));
    expect(screen.getByText('This is your own post; another moderator must act on it.')).toBeTruthy();
    expect(screen.queryByRole('button')).toBeNull();
    expect(screen.queryByRole('radio')).toBeNull();
  });
});

describe('AppealDecisionForm', () => {
  it('is closed, with the reason, for the moderator who took the action', () => {
    const onDecide = jest.fn(() => Promise.resolve());
    renderThemed(<AppealDecisionForm canDecide={false} onDecide={onDecide} />);
    expect(screen.getByText(/You took the action under appeal/)).toBeTruthy();
    const button = screen.getByRole('button', { name: 'Decide the appeal' });
    expect(button).toBeDisabled();
    fireEvent.press(button);
    expect(onDecide).not.toHaveBeenCalled();
  });

  it('sends the decision and its reason', async () => {
    const onDecide = jest.fn(() => Promise.resolve());
    renderThemed(<AppealDecisionForm canDecide onDecide={onDecide} />);
    fireEvent.press(screen.getByRole('button', { name: 'Decide the appeal' }));
    expect(await screen.findByText('Choose to uphold or overturn.')).toBeTruthy();
    fireEvent.press(screen.getByRole('radio', { name: 'Overturn — reverse it' }));
    fireEvent.changeText(screen.getByLabelText('Reason for the decision (the author sees it)'), 'The links were to the club’s own page.');
    fireEvent.press(screen.getByRole('button', { name: 'Decide the appeal' }));
    await waitFor(() => expect(onDecide).toHaveBeenCalledWith({ decision: 'overturn', reason: 'The links were to the club’s own page.' }));
  });
});

const oskar: Me = {
  ...signedInJuno, id: 3, handle: 'oskar-velde', displayName: 'Oskar Velde', email: 'oskar@racers.example', role: 'moderator', classesRaced: ['truggy-1-8-nitro'],
};

describe('the review queue screen', () => {
  beforeEach(() => rememberCsrfToken('t'));

  it('posts the action with its reason, then shows what was done and the refreshed queue', async () => {
    let acted = false;
    const { calls } = stubFetch(({ url, method }) => {
      if (url.endsWith('/api/me')) return { status: 200, body: { user: oskar } };
      if (url.includes('/api/moderation/queue')) {
        return { status: 200, body: acted ? { items: [], openReports: 0, openAppeals: 0 } : { items: [queueItemFixture()], openReports: 2, openAppeals: 0 } };
      }
      if (url.endsWith('/api/moderation/actions') && method === 'POST') {
        acted = true;
        const action = { id: 5, action: 'hide', targetType: 'setup', targetId: 41, reason: 'Spam or advertising.', createdAt: '2026-12-01T11:00:00.000Z', suspendedUntil: null, resolvedReports: 2 };
        return { status: 200, body: { action } };
      }
      return { status: 404, body: { error: { code: 'not_found', message: 'Not here.' } } };
    });
    renderWithQueries(<ModerationQueueScreen />);
    expect(await screen.findByText('2 open reports · 0 appeals waiting')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Hide as spam: CHEAP TYRES — best grip deals' }));
    fireEvent.press(screen.getByRole('button', { name: 'Hide it' }));
    const done = await screen.findByLabelText('Done just now');
    expect(within(done).getByText('✓ Hidden: setup “CHEAP TYRES — best grip deals” — 2 reports resolved.')).toBeTruthy();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ targetType: 'setup', targetId: 41, action: 'hide', reason: 'Spam or advertising.' });
    expect(await screen.findByText('Nothing waiting')).toBeTruthy();
  });

  it('tells racers the queue is for moderators', async () => {
    stubFetch(() => ({ status: 200, body: { user: signedInJuno } }));
    renderWithQueries(<ModerationQueueScreen />);
    expect(await screen.findByText('Moderators only')).toBeTruthy();
  });
});
