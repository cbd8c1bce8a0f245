import type { Page, RevisionCompare, RevisionHistory } from '@limitbook/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen, within } from '@/testing/render';
import { RevisionCompareView } from './revision-compare';

const person = { id: 'p', name: 'Idris Okafor', email: 'idris.okafor@brackwater.example' };
const review = { submittedAt: null, submittedBy: null, reviewers: [], note: null, comment: null };
const entry = (id: string, sequence: number, letter: string, state: 'released' | 'superseded') => ({
  id,
  sequence,
  revisionLetter: letter,
  state,
  title: 'Wall around suction port bores',
  version: 1,
  createdAt: '2026-12-01T09:00:00.000Z',
  createdBy: person,
  updatedAt: '2026-12-01T09:00:00.000Z',
  updatedBy: person,
  releasedAt: '2026-12-01T10:00:00.000Z',
  approvedBy: person,
  supersededAt: null,
  review,
  restoredFromId: null,
});
const revA = '11111111-1111-4111-8111-111111111111';
const revB = '22222222-2222-4222-8222-222222222222';
const history: RevisionHistory = { items: [entry(revB, 2, 'B', 'released'), entry(revA, 1, 'A', 'superseded')] };
const comparison: RevisionCompare = {
  from: { id: revA, revisionLetter: 'A', state: 'superseded', sequence: 1 },
  to: { id: revB, revisionLetter: 'B', state: 'released', sequence: 2 },
  title: { from: 'Wall around ports', to: 'Wall around suction port bores', changed: true },
  text: [
    { kind: 'unchanged', text: 'Purpose' },
    { kind: 'removed', text: 'Keep 1.5 mm of wall.' },
    { kind: 'added', text: 'Keep 2 mm of wall.' },
  ],
  blocks: [
    {
      blockId: 'b1',
      change: 'changed',
      method: 'wall-thickness v1',
      caption: 'Suction port bore',
      rows: [
        { setting: 'acceptance', path: null, from: 'minWall >= 1.5 mm', to: 'minWall >= 2 mm' },
        { setting: 'locked', path: 'positionTolerance', from: null, to: 'locked' },
      ],
    },
  ],
};
const page = { id: '7c9e6679-7425-40de-944b-e07fc1f90ae7', documentNumber: 'BW-STD-950', revision: { title: 'Wall around suction port bores' } } as unknown as Page;

describe('RevisionCompareView', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows the calculator settings before → after and the text side by side with insertions and deletions marked', async () => {
    const fetch = vi.fn(async (url: string) => jsonResponse(200, url.includes('/compare') ? comparison : history));
    vi.stubGlobal('fetch', fetch);
    render(<RevisionCompareView page={page} from={revA} to={revB} />);

    const settings = await screen.findByRole('table', { name: 'Settings of Suction port bore' });
    const rows = within(settings).getAllByRole('row').slice(1);
    expect(rows.map((row) => within(row).getAllByRole('cell').map((cell) => cell.textContent))).toEqual([
      ['Acceptance rule', 'minWall >= 1.5 mm', '', 'minWall >= 2 mm'],
      ['Locked input positionTolerance', 'none', '', 'locked'],
    ]);
    const text = screen.getByRole('table', { name: 'Text changes' });
    // The changed line sits beside its replacement with only the differing word marked.
    const [, changed] = within(text).getAllByRole('row').slice(1);
    const [before, after] = within(changed!).getAllByRole('cell');
    expect(before).toHaveTextContent('Keep 1.5 mm of wall.');
    expect(after).toHaveTextContent('Keep 2 mm of wall.');
    expect(within(before!).getByText('1.5').tagName).toBe('DEL');
    expect(within(after!).getByText('2').tagName).toBe('INS');
    expect(screen.getByText('Wall around ports').tagName).toBe('DEL');
    expect(String(fetch.mock.calls.find(([url]) => String(url).includes('/compare'))?.[0])).toBe(`/api/pages/${page.id}/compare?from=${revA}&to=${revB}`);
  });

  it('asks for two different revisions instead of comparing one with itself', async () => {
    const fetch = vi.fn(async (_url: string) => jsonResponse(200, history));
    vi.stubGlobal('fetch', fetch);
    render(<RevisionCompareView page={page} from={revA} to={revA} />);
    expect(await screen.findByText('Pick two different revisions.')).toBeInTheDocument();
    expect(fetch.mock.calls.some(([url]) => String(url).includes('/compare'))).toBe(false);
  });
});
