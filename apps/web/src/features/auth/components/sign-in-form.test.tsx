import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen } from '@/testing/render';
import { SignInForm } from './sign-in-form';

function answerSignIn(response: Response) {
  const fetch = vi.fn(async () => response);
  vi.stubGlobal('fetch', fetch);
  return fetch;
}

async function submit(user: ReturnType<typeof render>['user'], email: string, password: string) {
  await user.type(screen.getByLabelText(/e-mail/i), email);
  await user.type(screen.getByLabelText(/^password/i), password);
  await user.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('SignInForm', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows the server’s field messages beside the fields', async () => {
    answerSignIn(
      jsonResponse(400, {
        statusCode: 400,
        code: 'VALIDATION_FAILED',
        message: 'Check the highlighted fields',
        fields: { email: 'This address cannot sign in here', password: 'Password is too long' },
      }),
    );
    const { user } = render(<SignInForm onSuccess={() => {}} />);

    await submit(user, 'tomas.wren@brackwater.example', 'limitbook-reader');

    expect(await screen.findByText('This address cannot sign in here')).toBeInTheDocument();
    expect(screen.getByText('Password is too long')).toBeInTheDocument();
    expect(screen.getByLabelText(/e-mail/i)).toHaveAttribute('aria-invalid', 'true');
  });

  it('answers a 401 with one message that does not say which part was wrong', async () => {
    answerSignIn(jsonResponse(401, { statusCode: 401, code: 'UNAUTHENTICATED', message: 'Unknown user maren@x' }));
    const onSuccess = vi.fn();
    const { user } = render(<SignInForm onSuccess={onSuccess} />);

    await submit(user, 'maren.holt@brackwater.example', 'wrong-password');

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('The e-mail or password is not right.');
    expect(alert).not.toHaveTextContent('Unknown user');
    expect(onSuccess).not.toHaveBeenCalled();
  });

  it('tells a rate-limited user how long to wait', async () => {
    answerSignIn(jsonResponse(429, { statusCode: 429, code: 'RATE_LIMITED', message: 'Too many requests' }, { 'Retry-After': '300' }));
    const { user } = render(<SignInForm onSuccess={() => {}} />);

    await submit(user, 'maren.holt@brackwater.example', 'limitbook-admin');

    expect(await screen.findByRole('alert')).toHaveTextContent('Too many sign-in attempts. Try again in about 5 minutes.');
  });

  it('checks the fields before asking the server', async () => {
    const fetch = answerSignIn(jsonResponse(500, {}));
    const { user } = render(<SignInForm onSuccess={() => {}} />);

    await user.type(screen.getByLabelText(/e-mail/i), 'not-an-address');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Password is required')).toBeInTheDocument();
    expect(fetch).not.toHaveBeenCalled();
  });

  it('signs in and hands over on success', async () => {
    answerSignIn(
      jsonResponse(200, {
        accessToken: 'token',
        expiresIn: 900,
        user: { id: 'u4', email: 'tomas.wren@brackwater.example', name: 'Tomas Wren', role: 'reader' },
      }),
    );
    const onSuccess = vi.fn();
    const { user } = render(<SignInForm onSuccess={onSuccess} />);

    await submit(user, 'tomas.wren@brackwater.example', 'limitbook-reader');

    await vi.waitFor(() => expect(onSuccess).toHaveBeenCalled());
  });
});
