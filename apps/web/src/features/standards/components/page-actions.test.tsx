import type { Page } from '@limitbook/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/lib/session';
import { jsonResponse, render, screen, within } from '@/testing/render';
import { PageActions } from './page-actions';

const page = { id: '7c9e6679-7425-40de-944b-e07fc1f90ae7', documentNumber: 'BW-STD-112', draft: null, obsolete: null } as unknown as Page;

function signInAs(role: 'reader' | 'author' | 'admin') {
  session.signIn({ accessToken: `${role}-token`, expiresIn: 900, user: { id: role, email: `${role}@brackwater.example`, name: role, role } });
}

describe('PageActions', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('offers readers the history only, authors the editor too', () => {
    signInAs('reader');
    const { unmount } = render(<PageActions page={page} />);
    expect(screen.getByRole('link', { name: 'History' })).toHaveAttribute('href', '/standards/BW-STD-112/history');
    expect(screen.queryByRole('link', { name: 'Edit' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Obsolete…' })).not.toBeInTheDocument();
    unmount();

    signInAs('author');
    render(<PageActions page={page} />);
    expect(screen.getByRole('link', { name: 'Edit' })).toHaveAttribute('href', '/standards/BW-STD-112/edit');
    expect(screen.queryByRole('button', { name: 'Obsolete…' })).not.toBeInTheDocument();
  });

  it('asks an admin for a reason before marking the page obsolete, and shows the server’s message at the field', async () => {
    signInAs('admin');
    const fetch = vi.fn(async () =>
      jsonResponse(400, { statusCode: 400, code: 'VALIDATION_FAILED', message: 'Invalid', fields: { reason: 'The reason must be at most 2000 characters' } }),
    );
    vi.stubGlobal('fetch', fetch);
    const { user } = render(<PageActions page={page} />);

    await user.click(screen.getByRole('button', { name: 'Obsolete…' }));
    const dialog = within(screen.getByRole('dialog', { name: 'Mark BW-STD-112 obsolete?' }));
    await user.click(dialog.getByRole('button', { name: 'Mark obsolete' }));
    expect(await dialog.findByText('Give a reason')).toBeInTheDocument();
    expect(fetch).not.toHaveBeenCalled();

    await user.type(dialog.getByLabelText(/Reason/), 'Replaced by BW-STD-113');
    await user.click(dialog.getByRole('button', { name: 'Mark obsolete' }));
    expect(await dialog.findByText('The reason must be at most 2000 characters')).toBeInTheDocument();
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe(`/api/pages/${page.id}/obsolete`);
    expect(JSON.parse(String(init.body))).toEqual({ reason: 'Replaced by BW-STD-113' });
  });
});
