import type { Page, RevisionHistory as History } from '@limitbook/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/lib/session';
import { jsonResponse, render, screen, within } from '@/testing/render';
import { RevisionHistory } from './revision-history';

const person = (name: string) => ({ id: name, name, email: `${name.toLowerCase().replace(' ', '.')}@brackwater.example` });
const revA = '11111111-1111-4111-8111-111111111111';
const revB = '22222222-2222-4222-8222-222222222222';
const entry = (id: string, sequence: number, letter: string, state: 'released' | 'superseded', note: string | null) => ({
  id,
  sequence,
  revisionLetter: letter,
  state,
  title: 'Wall around suction port bores',
  version: 3,
  createdAt: '2026-12-01T09:00:00.000Z',
  createdBy: person('Idris Okafor'),
  updatedAt: '2026-12-01T09:00:00.000Z',
  updatedBy: person('Idris Okafor'),
  releasedAt: '2026-12-01T10:00:00.000Z',
  approvedBy: person('Sunniva Lind'),
  supersededAt: null,
  review: { submittedAt: '2026-12-01T09:30:00.000Z', submittedBy: person('Idris Okafor'), reviewers: [person('Sunniva Lind')], note, comment: 'Agreed.' },
  restoredFromId: null,
});
const history: History = { items: [entry(revB, 2, 'B', 'released', 'Raise the wall to 2 mm.'), entry(revA, 1, 'A', 'superseded', null)] };
const page = { id: '7c9e6679-7425-40de-944b-e07fc1f90ae7', documentNumber: 'BW-STD-950', draft: null, revision: { title: 'Wall around suction port bores' } } as unknown as Page;

function signInAs(role: 'reader' | 'admin') {
  session.signIn({ accessToken: `${role}-token`, expiresIn: 900, user: { id: role, email: `${role}@brackwater.example`, name: role, role } });
}

describe('RevisionHistory', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('lists every revision with its people and notes, and compares the two ticked, older first', async () => {
    signInAs('reader');
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(200, history)));
    const { user } = render(<RevisionHistory page={page} renderReleaseExtra={(revision) => <p>impact of {revision.revisionLetter}</p>} />);

    const revisions = await screen.findByRole('list', { name: 'Revisions' });
    const [b, a] = within(revisions).getAllByRole('listitem');
    expect(b).toHaveTextContent('Rev. B');
    expect(b).toHaveTextContent('Raise the wall to 2 mm.');
    expect(b).toHaveTextContent('Sunniva Lind');
    expect(b).toHaveTextContent('impact of B');
    expect(a).toHaveTextContent('Superseded');
    expect(screen.queryByRole('button', { name: /Start a new draft/ })).not.toBeInTheDocument();

    const compare = screen.getByRole('link', { name: 'Compare selected' });
    expect(compare).toHaveAttribute('aria-disabled', 'true');
    await user.click(screen.getByRole('checkbox', { name: 'Compare Rev. B' }));
    await user.click(screen.getByRole('checkbox', { name: 'Compare Rev. A' }));
    expect(compare).toHaveAttribute('href', `/standards/BW-STD-950/compare?from=${revA}&to=${revB}`);
  });

  it('lets an admin start a new draft from an old revision, and shows why the server refused', async () => {
    signInAs('admin');
    const fetch = vi.fn(async (url: string, init?: RequestInit) =>
      init?.method === 'POST'
        ? jsonResponse(409, { statusCode: 409, code: 'CONFLICT', message: 'BW-STD-950 already has an open draft.' })
        : jsonResponse(200, history),
    );
    vi.stubGlobal('fetch', fetch);
    const { user } = render(<RevisionHistory page={page} />);

    const restore = await screen.findAllByRole('button', { name: 'Start a new draft from this revision' });
    await user.click(restore[1]!);
    const dialog = within(screen.getByRole('dialog', { name: 'Start a new draft from Rev. A?' }));
    await user.click(dialog.getByRole('button', { name: 'Start the draft' }));

    expect(await dialog.findByRole('alert')).toHaveTextContent('BW-STD-950 already has an open draft.');
    const post = fetch.mock.calls.find(([, init]) => init?.method === 'POST');
    expect(post?.[0]).toBe(`/api/pages/${page.id}/revisions/${revA}/restore`);
  });
});
