import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '../../components/SignInForm';
import { ApiRequestError, rememberCsrfToken } from '../../hooks/api';
import { useSignIn } from '../../hooks/auth';
import { renderThemed, renderWithQueries, stubFetch } from './support/render';

function typeCredentials(login: string, password: string) {
  fireEvent.changeText(screen.getByLabelText('E-mail or handle'), login);
  fireEvent.changeText(screen.getByLabelText('Password'), password);
}

describe('SignInForm', () => {
  it('shows the server’s field messages next to the fields they concern', () => {
    const error = new ApiRequestError(400, 'validation_failed', 'Check the highlighted fields.', {
      login: 'No account uses that handle format.',
      password: 'Passwords are at most 200 characters.',
    });
    renderThemed(<SignInForm onSubmit={jest.fn()} pending={false} error={error} />);
    const alerts = screen.getAllByRole('alert').map((a) => a.props.children);
    expect(alerts).toEqual(['No account uses that handle format.', 'Passwords are at most 200 characters.']);
  });

  it('says how long to wait when the server rate-limits sign-in', () => {
    const error = new ApiRequestError(429, 'rate_limited', 'Slow down.', { retryAfterSeconds: 42 });
    renderThemed(<SignInForm onSubmit={jest.fn()} pending={false} error={error} />);
    expect(screen.getByRole('alert')).toHaveTextContent('Too many attempts. Try again in 42 s.');
  });

  it('checks the fields with the shared schema before sending anything', () => {
    const onSubmit = jest.fn();
    renderThemed(<SignInForm onSubmit={onSubmit} pending={false} error={null} />);
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByText('Enter your e-mail address or handle.')).toBeTruthy();
    expect(screen.getByText('Enter your password.')).toBeTruthy();
  });

  it('sends the typed credentials when Enter is pressed in the password field', () => {
    const onSubmit = jest.fn();
    renderThemed(<SignInForm onSubmit={onSubmit} pending={false} error={null} />);
    typeCredentials('maren', 'kiln-night-42');
    fireEvent(screen.getByLabelText('Password'), 'submitEditing');
    expect(onSubmit).toHaveBeenCalledWith({ login: 'maren', password: 'kiln-night-42' });
  });

  it('keeps what was typed when the server says no, and shows its message', () => {
    const onSubmit = jest.fn();
    const { rerender } = renderThemed(<SignInForm onSubmit={onSubmit} pending={false} error={null} />);
    typeCredentials('maren', 'wrong-password-1');
    const refused = new ApiRequestError(401, 'invalid_credentials', 'That handle or e-mail and password do not match.');
    rerender(<SignInForm onSubmit={onSubmit} pending={false} error={refused} />);
    expect(screen.getByRole('alert')).toHaveTextContent('That handle or e-mail and password do not match.');
    expect(screen.getByLabelText('E-mail or handle').props.value).toBe('maren');
    expect(screen.getByLabelText('Password').props.value).toBe('wrong-password-1');
  });

  it('shows progress and refuses a second submit while signing in', () => {
    const onSubmit = jest.fn();
    renderThemed(<SignInForm onSubmit={onSubmit} pending error={null} />);
    const button = screen.getByRole('button', { name: 'Signing in…' });
    expect(button).toBeDisabled();
    typeCredentials('maren', 'kiln-night-42');
    fireEvent(screen.getByLabelText('Password'), 'submitEditing');
    expect(onSubmit).not.toHaveBeenCalled();
  });
});

function SignInHarness() {
  const signIn = useSignIn();
  return <SignInForm onSubmit={(v) => signIn.mutateAsync(v)} pending={signIn.isPending} error={signIn.error} />;
}

describe('signing in through the API client', () => {
  beforeEach(() => rememberCsrfToken(null));

  it('shows the rate-limit wait and the server’s field details that come back from the API', async () => {
    let attempt = 0;
    stubFetch(({ url }) => {
      if (url.endsWith('/api/auth/csrf')) return { status: 200, body: { csrfToken: 'token-1' } };
      attempt += 1;
      return attempt === 1
        ? { status: 400, body: { error: { code: 'validation_failed', message: 'Invalid input', details: { login: 'Too long for a handle.' } } } }
        : { status: 429, body: { error: { code: 'rate_limited', message: 'Too many requests', details: { retryAfterSeconds: 42 } } } };
    });
    renderWithQueries(<SignInHarness />);
    typeCredentials('maren', 'kiln-night-42');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Too long for a handle.')).toBeTruthy();
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Too many attempts. Try again in 42 s.')).toBeTruthy();
    expect(screen.queryByText('Too long for a handle.')).toBeNull();
  });

  it('sends the CSRF token and stores the signed-in racer', async () => {
    const user = {
      id: 7, handle: 'maren', displayName: 'Maren Holloway', email: 'maren@example.test', emailVerified: true,
      pendingEmail: null, role: 'racer', bio: '', homeTrack: '', classesRaced: [], units: { length: 'mm', temperature: 'C' },
      hasPassword: true, githubLogin: null, createdAt: '2025-03-01T10:00:00.000Z',
    };
    const { calls } = stubFetch(({ url }) =>
      url.endsWith('/api/auth/csrf')
        ? { status: 200, body: { csrfToken: 'token-1' } }
        : { status: 200, body: { user, csrfToken: 'token-2' } },
    );
    const { client } = renderWithQueries(<SignInHarness />);
    typeCredentials('maren', 'kiln-night-42');
    fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(client.getQueryData(['auth', 'me'])).toEqual(user));
    const post = calls.find((c) => c.method === 'POST');
    expect(post?.headers['X-CSRF-Token']).toBe('token-1');
    expect(post?.body).toEqual({ login: 'maren', password: 'kiln-night-42' });
  });
});
