import type { LaggingBlocks, MethodSummary, Page } from '@limitbook/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/lib/session';
import { jsonResponse, render, screen, waitFor, within } from '@/testing/render';
import { LaggingBlocksNotice } from './lagging-blocks-notice';

const pageId = '7c9e6679-7425-40de-944b-e07fc1f90ae7';
const squeezeBlock = '1b4e28ba-2fa1-41d2-883f-0016d3cca427';
const wallBlock = '6ec0bd7f-11c0-43da-975e-2a8ad9ebae0b';

const page = (draft: Page['draft'] = null) => ({ id: pageId, documentNumber: 'BW-STD-140', draft, obsolete: null }) as unknown as Page;

const draftSummary = { id: 'r-2', state: 'draft', revisionLetter: null, title: 'Gland design', version: 7, updatedAt: '2026-11-30T10:00:00Z', publishedAt: null } as const;
const draftPage: Page = {
  id: pageId,
  documentNumber: 'BW-STD-140',
  collection: { id: 'c-1', key: 'seals', name: 'Seals' },
  owner: null,
  tags: [],
  createdAt: '2026-10-01T10:00:00Z',
  updatedAt: '2026-11-30T10:00:00Z',
  published: null,
  draft: draftSummary,
  obsolete: null,
  watching: false,
  revision: {
    ...draftSummary,
    sequence: 2,
    document: { type: 'doc', content: [] },
    createdAt: '2026-11-30T09:00:00Z',
    createdBy: null,
    publishedBy: null,
    supersededAt: null,
    review: { submittedAt: null, submittedBy: null, reviewers: [], note: null, comment: null },
    restoredFromId: null,
  },
  fileUrls: {},
};

const squeezeMethod: MethodSummary = {
  id: 'house:gland-squeeze',
  version: 3,
  source: 'in-house',
  title: 'Gland squeeze',
  description: 'Squeeze of an O-ring cord in its gland.',
  references: [],
  cautions: [],
  inputSchema: {},
  outputs: [],
};

const lagging = (items: LaggingBlocks['items']): LaggingBlocks => ({ pageId, revisionId: 'r-1', state: 'released', items });
const squeezeLagging = { blockId: squeezeBlock, caption: 'Gland 12 squeeze', method: 'house:gland-squeeze', pinnedVersion: 1, latestVersion: 3 };
const wallLagging = { blockId: wallBlock, caption: 'Port wall', method: 'house:port-wall', pinnedVersion: 2, latestVersion: 4 };

function signInAs(role: 'reader' | 'author' | 'admin') {
  session.signIn({ accessToken: `${role}-token`, expiresIn: 900, user: { id: role, email: `${role}@brackwater.example`, name: role, role } });
}

type Call = { url: string; method: string; body: unknown };

/** Answers the page's lagging blocks and the method list; `moveForward` answers each move in turn. */
function stubServer(items: LaggingBlocks['items'], moveForward: Array<() => Response> = []) {
  const calls: Call[] = [];
  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = String(input);
    const method = init?.method ?? 'GET';
    calls.push({ url, method, body: init?.body ? JSON.parse(String(init.body)) : undefined });
    if (url.endsWith('/api/methods')) return jsonResponse(200, { items: [squeezeMethod] });
    if (url.endsWith(`/api/pages/${pageId}/lagging-blocks`)) return jsonResponse(200, lagging(items));
    if (url.endsWith(`/api/pages/${pageId}/lagging-blocks/move-forward`)) {
      const next = moveForward.shift();
      if (!next) throw new Error('unexpected move');
      return next();
    }
    if (url.includes(`/api/pages/${pageId}?view=draft`)) return jsonResponse(200, draftPage);
    throw new Error(`unexpected ${method} ${url}`);
  });
  vi.stubGlobal('fetch', fetch);
  return calls;
}

const moves = (calls: Call[]) => calls.filter((call) => call.url.endsWith('/move-forward'));

describe('LaggingBlocksNotice', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows readers nothing and does not ask the server', async () => {
    signInAs('reader');
    const calls = stubServer([squeezeLagging]);
    render(<LaggingBlocksNotice page={page()} />);
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(screen.queryByTestId('lagging-blocks')).not.toBeInTheDocument();
    expect(calls.some((call) => call.url.includes('lagging-blocks'))).toBe(false);
  });

  it('shows nothing when no block lags', async () => {
    signInAs('author');
    const calls = stubServer([]);
    render(<LaggingBlocksNotice page={page()} />);
    await waitFor(() => expect(calls.some((call) => call.url.endsWith('/lagging-blocks'))).toBe(true));
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(screen.queryByTestId('lagging-blocks')).not.toBeInTheDocument();
  });

  it('names each lagging block with its method and versions, and moves one forward with a link to the draft', async () => {
    signInAs('author');
    const calls = stubServer(
      [squeezeLagging, wallLagging],
      [() => jsonResponse(200, { pageId, revisionId: 'r-2', version: 1, moved: [{ blockId: squeezeBlock, from: 1, to: 3 }] })],
    );
    const { user } = render(<LaggingBlocksNotice page={page()} />);

    const notice = within(await screen.findByTestId('lagging-blocks'));
    expect(notice.getByText('2 calculators pin an older method version')).toBeInTheDocument();
    expect(notice.getByText('Gland 12 squeeze')).toBeInTheDocument();
    expect(await notice.findByText('Gland squeeze: pinned v1 → latest v3')).toBeInTheDocument();
    // A method missing from the list is named by its id.
    expect(notice.getByText('house:port-wall: pinned v2 → latest v4')).toBeInTheDocument();

    await user.click(notice.getByRole('button', { name: 'Move Gland 12 squeeze forward to v3' }));
    expect(await screen.findByText('Block moved forward in the draft')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Open the draft' })).toHaveAttribute('href', '/standards/BW-STD-140/edit');
    expect(moves(calls).map((call) => call.body)).toEqual([{ blockIds: [squeezeBlock] }]);
  });

  it('moves all blocks at once, sending the open draft’s version when the server asks for it', async () => {
    signInAs('admin');
    const calls = stubServer(
      [squeezeLagging, wallLagging],
      [
        () => jsonResponse(409, { statusCode: 409, code: 'CONFLICT', message: 'This page has a draft at version 7; send it as baseVersion to change it.', fields: { baseVersion: 'The draft is at version 7' } }),
        () =>
          jsonResponse(200, {
            pageId,
            revisionId: 'r-2',
            version: 8,
            moved: [
              { blockId: squeezeBlock, from: 1, to: 3 },
              { blockId: wallBlock, from: 2, to: 4 },
            ],
          }),
      ],
    );
    const { user } = render(<LaggingBlocksNotice page={page()} />);

    await user.click(await screen.findByRole('button', { name: 'Move all forward' }));
    expect(await screen.findByText('2 blocks moved forward in the draft')).toBeInTheDocument();
    expect(moves(calls).map((call) => call.body)).toEqual([{ blockIds: [squeezeBlock, wallBlock] }, { blockIds: [squeezeBlock, wallBlock], baseVersion: 7 }]);
  });

  it('shows the server’s refusal inside the notice', async () => {
    signInAs('author');
    stubServer(
      [squeezeLagging],
      [() => jsonResponse(400, { statusCode: 400, code: 'VALIDATION_FAILED', message: 'Some blocks cannot be moved forward.', fields: { 'blockIds.0': 'Not a block of this page pinned to an older version' } })],
    );
    const { user } = render(<LaggingBlocksNotice page={page()} />);

    const notice = within(await screen.findByTestId('lagging-blocks'));
    expect(notice.getByText('A calculator pins an older method version')).toBeInTheDocument();
    expect(notice.queryByRole('button', { name: 'Move all forward' })).not.toBeInTheDocument();
    await user.click(notice.getByRole('button', { name: 'Move Gland 12 squeeze forward to v3' }));
    const problem = within(await notice.findByRole('alert'));
    expect(problem.getByText('Not moved forward')).toBeInTheDocument();
    expect(problem.getByText('Some blocks cannot be moved forward.')).toBeInTheDocument();
    expect(problem.getByText('Not a block of this page pinned to an older version')).toBeInTheDocument();
  });

  it('holds the buttons while the page’s revision is in review', async () => {
    signInAs('author');
    stubServer([squeezeLagging]);
    render(<LaggingBlocksNotice page={page({ ...draftSummary, state: 'in_review' })} />);
    const notice = within(await screen.findByTestId('lagging-blocks'));
    expect(notice.getByRole('button', { name: 'Move Gland 12 squeeze forward to v3' })).toBeDisabled();
    expect(notice.getByText(/has a revision in review/)).toBeInTheDocument();
  });
});
