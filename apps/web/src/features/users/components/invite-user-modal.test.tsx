import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen, within } from '@/testing/render';
import { session } from '@/lib/session';
import { InviteUserModal } from './invite-user-modal';

function dialog() {
  return within(screen.getByRole('dialog', { name: 'Invite a colleague' }));
}

describe('InviteUserModal', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('checks e-mail and name before sending anything', async () => {
    const fetch = vi.fn();
    vi.stubGlobal('fetch', fetch);
    const { user } = render(<InviteUserModal opened onClose={() => {}} />);

    await user.type(dialog().getByLabelText(/e-mail/i), 'ines@');
    await user.click(dialog().getByRole('button', { name: 'Send invitation' }));

    expect(await dialog().findByText('Enter a valid e-mail address')).toBeInTheDocument();
    expect(dialog().getByText('Name is required')).toBeInTheDocument();
    expect(fetch).not.toHaveBeenCalled();
  });

  it('sends the invitation with the chosen role and closes', async () => {
    session.signIn({ accessToken: 'admin-token', expiresIn: 900, user: { id: 'a', email: 'maren.holt@brackwater.example', name: 'Maren Holt', role: 'admin' } });
    const fetch = vi.fn(async () =>
      jsonResponse(201, { id: 'n1', email: 'ines.varga@brackwater.example', name: 'Ines Varga', role: 'author', status: 'invited', createdAt: '2026-01-05T09:00:00.000Z', lastSignInAt: null }),
    );
    vi.stubGlobal('fetch', fetch);
    const onClose = vi.fn();
    const { user } = render(<InviteUserModal opened onClose={onClose} />);

    await user.type(dialog().getByLabelText(/e-mail/i), 'ines.varga@brackwater.example');
    await user.type(dialog().getByLabelText(/^name/i), 'Ines Varga');
    await user.click(dialog().getByRole('combobox', { name: 'Role' }));
    await user.click(screen.getByRole('option', { name: 'Author' }));
    await user.click(dialog().getByRole('button', { name: 'Send invitation' }));

    await vi.waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(fetch).toHaveBeenCalledOnce();
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/users/invitations');
    expect(JSON.parse(String(init.body))).toEqual({ email: 'ines.varga@brackwater.example', name: 'Ines Varga', role: 'author' });
    expect(new Headers(init.headers).get('Authorization')).toBe('Bearer admin-token');
  });

  it('puts the server’s answer on the field it concerns', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        jsonResponse(400, { statusCode: 400, code: 'VALIDATION_FAILED', message: 'Invalid', fields: { email: 'Someone already uses this address' } }),
      ),
    );
    const { user } = render(<InviteUserModal opened onClose={() => {}} />);

    await user.type(dialog().getByLabelText(/e-mail/i), 'maren.holt@brackwater.example');
    await user.type(dialog().getByLabelText(/^name/i), 'Maren Again');
    await user.click(dialog().getByRole('button', { name: 'Send invitation' }));

    expect(await dialog().findByText('Someone already uses this address')).toBeInTheDocument();
    expect(dialog().getByLabelText(/e-mail/i)).toHaveAttribute('aria-invalid', 'true');
  });
});
