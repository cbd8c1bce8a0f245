import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen } from '@/testing/render';
import { ResetPasswordForm } from './reset-password-form';

const passphrase = 'copper gland seven lanterns';

describe('ResetPasswordForm', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('refuses two different passwords at the repeat field without asking the server', async () => {
    const fetch = vi.fn(async () => jsonResponse(204));
    vi.stubGlobal('fetch', fetch);
    const { user } = render(<ResetPasswordForm token="t0ken" onSuccess={() => {}} />);

    expect(screen.getByLabelText(/^New password/)).toHaveAttribute('autocomplete', 'new-password');
    await user.type(screen.getByLabelText(/^New password/), passphrase);
    await user.type(screen.getByLabelText(/^Repeat the new password/), `${passphrase}!`);
    await user.click(screen.getByRole('button', { name: 'Save new password' }));

    expect(await screen.findByText('The two passwords differ')).toBeInTheDocument();
    expect(fetch).not.toHaveBeenCalled();
  });

  it('sends the token and the password once both agree', async () => {
    const fetch = vi.fn(async () => jsonResponse(204));
    vi.stubGlobal('fetch', fetch);
    const onSuccess = vi.fn();
    const { user } = render(<ResetPasswordForm token="t0ken" onSuccess={onSuccess} />);

    await user.type(screen.getByLabelText(/^New password/), passphrase);
    await user.type(screen.getByLabelText(/^Repeat the new password/), passphrase);
    await user.click(screen.getByRole('button', { name: 'Save new password' }));

    await vi.waitFor(() => expect(onSuccess).toHaveBeenCalled());
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/auth/reset-password');
    expect(JSON.parse(String(init.body))).toEqual({ token: 't0ken', password: passphrase });
  });
});
