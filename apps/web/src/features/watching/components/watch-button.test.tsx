import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen } from '@/testing/render';
import { WatchButton } from './watch-button';

const pageId = '7c9e6679-7425-40de-944b-e07fc1f90ae7';

describe('WatchButton', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('watches, then stops watching, telling the caller each time', async () => {
    const fetch = vi.fn(async (_url: string, init?: RequestInit) => (init?.method === 'DELETE' ? new Response(null, { status: 200 }) : jsonResponse(200, { pageId, watching: true })));
    vi.stubGlobal('fetch', fetch);
    const onChanged = vi.fn();
    const { user } = render(<WatchButton pageId={pageId} documentNumber="BW-STD-112" watching={false} onChanged={onChanged} />);

    await user.click(screen.getByRole('button', { name: 'Watch' }));
    expect(await screen.findByRole('button', { name: 'Unwatch' })).toHaveAttribute('aria-pressed', 'true');
    expect(await screen.findByText('Watching BW-STD-112')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Unwatch' }));
    expect(await screen.findByRole('button', { name: 'Watch' })).toHaveAttribute('aria-pressed', 'false');

    expect(fetch.mock.calls.map(([url, init]) => `${init?.method} ${url}`)).toEqual([`POST /api/pages/${pageId}/watch`, `DELETE /api/pages/${pageId}/watch`]);
    expect(onChanged.mock.calls).toEqual([[true], [false]]);
  });

  it('keeps the state and says why when the server refuses', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(404, { statusCode: 404, code: 'NOT_FOUND', message: 'No page with this id.' })));
    const { user } = render(<WatchButton pageId={pageId} documentNumber="BW-STD-112" watching={false} />);
    await user.click(screen.getByRole('button', { name: 'Watch' }));
    expect(await screen.findByText('No page with this id.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Watch' })).toHaveAttribute('aria-pressed', 'false');
  });
});
