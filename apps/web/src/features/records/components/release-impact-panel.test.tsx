import type { ImpactReport } from '@limitbook/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen, within } from '@/testing/render';
import { ReleaseImpactPanel } from './release-impact-panel';

const pageId = '7c9e6679-7425-40de-944b-e07fc1f90ae7';
const revisionId = '22222222-2222-4222-8222-222222222222';
const recordId = '9b2f0c1e-1111-4e22-8a33-444455556666';
const report: ImpactReport = {
  id: 'r1',
  pageId,
  fromRevisionId: '11111111-1111-4111-8111-111111111111',
  toRevisionId: revisionId,
  changedBlocks: [{ blockId: 'b1', caption: 'Suction port bore', changes: ['acceptance'] }],
  recordsChecked: 3,
  affected: [
    {
      recordId,
      blockId: 'b1',
      owner: { id: 'u', name: 'Tomas Wren', email: 'tomas.wren@brackwater.example' },
      before: { pass: true, keyOutputs: { minWall: 1.6 } },
      after: { pass: false, keyOutputs: { minWall: 1.6 } },
    },
  ],
  createdBy: null,
  createdAt: '2026-12-02T10:00:00.000Z',
};

describe('ReleaseImpactPanel', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    vi.useRealTimers();
  });

  it('says the check is running, asks again, and then lists the records whose verdict changes with links', async () => {
    const answers = [{ status: 'pending', report: null }, { status: 'ready', report }];
    const fetch = vi.fn(async () => jsonResponse(200, answers.length > 1 ? answers.shift() : answers[0]));
    vi.stubGlobal('fetch', fetch);
    render(<ReleaseImpactPanel pageId={pageId} revisionId={revisionId} revisionLetter="B" />);

    expect(await screen.findByText(/Checking the records saved under the previous release against Rev\. B/)).toBeInTheDocument();
    // Polled every 2 s while pending.
    const table = await screen.findByRole('table', { name: 'Records whose result changes' }, { timeout: 5000 });
    expect(screen.getByText(/1 of 3 saved records comes out differently under Rev\. B/)).toBeInTheDocument();
    const row = within(table).getAllByRole('row')[1]!;
    expect(within(row).getByRole('link', { name: recordId.slice(0, 8) })).toHaveAttribute('href', `/records/${recordId}`);
    expect(within(row).getByText('pass')).toBeInTheDocument();
    expect(within(row).getByText('fail')).toBeInTheDocument();
    expect(fetch).toHaveBeenCalledTimes(2);
    expect(String((fetch.mock.calls[0] as unknown as [string])[0])).toBe(`/api/pages/${pageId}/revisions/${revisionId}/impact`);
  });

  it('shows nothing for a first release, which replaced no rule', async () => {
    const fetch = vi.fn(async () => jsonResponse(200, { status: 'none', report: null }));
    vi.stubGlobal('fetch', fetch);
    render(<ReleaseImpactPanel pageId={pageId} revisionId={revisionId} revisionLetter="A" />);
    await vi.waitFor(() => expect(fetch).toHaveBeenCalled());
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(screen.queryByTestId('release-impact')).not.toBeInTheDocument();
  });
});
