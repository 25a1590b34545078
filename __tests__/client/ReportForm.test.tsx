import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { ReportControl } from '../../components/ReportControl';
import { ReportForm } from '../../components/ReportForm';
import { ApiRequestError, rememberCsrfToken } from '../../hooks/api';
import { authKeys } from '../../hooks/auth';
import { renderThemed, renderWithQueries, stubFetch } from './support/render';
import { signedInJuno } from './support/historyFixtures';

jest.mock('expo-router', () => ({
  Link: ({ children }: { children: unknown }) => children,
  usePathname: () => '/setups/41',
}));

function renderForm(onSubmit = jest.fn(() => Promise.resolve())) {
  const onClose = jest.fn();
  renderThemed(<ReportForm target={{ type: 'setup', id: 41 }} what="this setup" onSubmit={onSubmit} onClose={onClose} />);
  return { onSubmit, onClose };
}

const send = () => fireEvent.press(screen.getByRole('button', { name: 'Send report' }));

describe('ReportForm', () => {
  it('asks for a reason first, and for a note when the reason is “Something else”', async () => {
    const { onSubmit } = renderForm();
    send();
    expect(await screen.findByText('Choose the reason that fits best.')).toBeTruthy();
    fireEvent.press(screen.getByRole('radio', { name: /Something else/ }));
    send();
    expect(await screen.findByText('Say what is wrong when the reason is “Something else”.')).toBeTruthy();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.changeText(screen.getByLabelText('Note for the moderators (needed for “Something else”)'), 'Copied word for word from a club forum.');
    send();
    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith({ targetType: 'setup', targetId: 41, reason: 'other', note: 'Copied word for word from a club forum.' }),
    );
  });

  it('shows every reason with its hint, and thanks the reporter with a way to follow it', async () => {
    renderForm();
    expect(screen.getByText('Advice that could hurt someone: fuel, batteries, hot engines, spinning parts.')).toBeTruthy();
    fireEvent.press(screen.getByRole('radio', { name: /Spam or advertising/ }));
    send();
    expect(await screen.findByText('Thanks — moderators will look at it; follow it in My reports.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Open My reports' })).toBeTruthy();
  });

  it('explains a repeat report and links to the open one, keeping the choices', async () => {
    renderForm(jest.fn(() =>
      Promise.reject(new ApiRequestError(409, 'conflict', 'You have already reported this setup and your report is still open. You can follow it under My reports.', { reportId: 3 })),
    ));
    fireEvent.press(screen.getByRole('radio', { name: /Abusive/ }));
    send();
    expect(await screen.findByText(/already reported this setup/)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'See it in My reports' })).toBeTruthy();
    expect(screen.getByRole('radio', { name: /Abusive/, checked: true })).toBeTruthy();
  });

  it('shows the refusal of a report of one’s own post without the My reports link', async () => {
    renderForm(jest.fn(() => Promise.reject(new ApiRequestError(409, 'conflict', 'You cannot report your own setup. Edit or delete it instead.'))));
    fireEvent.press(screen.getByRole('radio', { name: /Spam or advertising/ }));
    send();
    expect(await screen.findByText('You cannot report your own setup. Edit or delete it instead.')).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'See it in My reports' })).toBeNull();
  });

  it('passes on the report limit’s own words, which say when the next report is possible', async () => {
    renderForm(jest.fn(() =>
      Promise.reject(new ApiRequestError(429, 'rate_limited', 'You can file 10 reports an hour. You can file the next one in 20 minutes.', { retryAfterSeconds: 1200 })),
    ));
    fireEvent.press(screen.getByRole('radio', { name: /Unsafe advice/ }));
    send();
    expect(await screen.findByText('You can file 10 reports an hour. You can file the next one in 20 minutes.')).toBeTruthy();
  });
});

describe('ReportControl', () => {
  beforeEach(() => rememberCsrfToken('t'));

  it('is not offered on one’s own post', async () => {
    stubFetch(() => ({ status: 200, body: { user: signedInJuno } }));
    const { client } = renderWithQueries(
      <>
        <ReportControl target={{ type: 'setup', id: 7 }} ownerHandle="juno_braithwick" what="this setup" />
        <ReportControl target={{ type: 'comment', id: 3 }} ownerHandle="pell-strand" what="the comment by @pell-strand" />
      </>,
    );
    // Someone else's comment gets its button once the sign-in is known; Juno's own setup does not.
    expect(await screen.findByRole('button', { name: 'Report the comment by @pell-strand' })).toBeTruthy();
    expect(client.getQueryData(authKeys.me())).toEqual(signedInJuno);
    expect(screen.queryByRole('button', { name: 'Report this setup' })).toBeNull();
  });

  it('sends the report to the API with the chosen reason and note', async () => {
    const { calls } = stubFetch(({ url }) =>
      url.endsWith('/api/me') ? { status: 200, body: { user: signedInJuno } } : { status: 201, body: { report: reportAnswer } },
    );
    renderWithQueries(<ReportControl target={{ type: 'comment', id: 88 }} ownerHandle="spoke_deals" what="the comment by @spoke_deals" />);
    fireEvent.press(await screen.findByRole('button', { name: 'Report the comment by @spoke_deals' }));
    fireEvent.press(screen.getByRole('radio', { name: /Spam or advertising/ }));
    fireEvent.changeText(screen.getByLabelText('Note for the moderators (optional)'), 'Shop link again.');
    send();
    expect(await screen.findByText('Thanks — moderators will look at it; follow it in My reports.')).toBeTruthy();
    const post = calls.find((c) => c.method === 'POST');
    expect(post?.url).toMatch(/\/api\/reports$/);
    expect(post?.body).toEqual({ targetType: 'comment', targetId: 88, reason: 'spam', note: 'Shop link again.' });
  });

  it('asks a signed-out reader to sign in and come back', async () => {
    stubFetch(() => ({ status: 200, body: { user: null } }));
    renderWithQueries(<ReportControl target={{ type: 'setup', id: 7 }} ownerHandle="juno_braithwick" what="this setup" />);
    fireEvent.press(await screen.findByRole('button', { name: 'Report this setup' }));
    expect(screen.getByRole('link', { name: 'Sign in to report' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Send report' })).toBeNull();
  });
});

const reportAnswer = {
  id: 1, targetType: 'comment', targetId: 88, targetLabel: 'Shop link again', targetPath: '/setups/7', reason: 'spam', note: 'Shop link again.',
  status: 'open', outcome: null, outcomeText: null, createdAt: '2026-12-01T10:00:00.000Z', resolvedAt: null,
};
