import type { CalculationRecord } from '@limitbook/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen } from '@/testing/render';
import { RecordView } from './record-view';

const pageId = '7c9e6679-7425-40de-944b-e07fc1f90ae7';
const revisionId = '11111111-1111-4111-8111-111111111111';
const blockId = 'b73ad147-41ce-4527-968d-505fd6e1fe82';
const record: CalculationRecord = {
  id: '9b2f0c1e-1111-4e22-8a33-444455556666',
  page: { id: pageId, documentNumber: 'BW-STD-112', title: 'Minimum wall between ports and the main bore' },
  revision: { id: revisionId, sequence: 1, revisionLetter: 'A', state: 'superseded' },
  blockId,
  method: 'wall-thickness',
  methodVersion: 1,
  unit: 'mm',
  inputs: { positionTolerance: 0.2, feature: { upperLimit: 26.5 } },
  outputs: { minWall: 1.6 },
  verdict: { pass: true, summary: 'Meets the rule minWall ≥ 1.5 mm', checks: [] },
  warnings: [],
  // (29.9 − 26.5)/2 − 0.1 = 1.6: ASME Y14.5-2018 §7.3.3 (resultant condition), as in the e2e test.
  steps: [{ label: 'Minimum wall', latex: 'w_{min} = 1.6', value: '1.6 mm' }],
  acceptance: { output: 'minWall', operator: '>=', value: 1.5, unit: 'mm' },
  reference: { partNumber: 'PH-2210-04', drawing: 'D-88121 rev C' },
  createdBy: { id: 'u', name: 'Tomas Wren', email: 'tomas.wren@brackwater.example' },
  createdAt: '2026-12-02T10:00:00.000Z',
};

function answer(url: string) {
  if (url.endsWith('/impact')) {
    return jsonResponse(200, {
      items: [{ reportId: 'r1', toRevision: { id: 'r2', revisionLetter: 'B' }, checkedAt: '2026-12-02T11:00:00.000Z', before: { pass: true, keyOutputs: {} }, after: { pass: false, keyOutputs: {} } }],
    });
  }
  if (url.startsWith('/api/records/')) return jsonResponse(200, record);
  if (url.startsWith(`/api/pages/${pageId}/revisions/`)) {
    return jsonResponse(200, {
      id: revisionId,
      state: 'superseded',
      sequence: 1,
      revisionLetter: 'A',
      title: 'Minimum wall',
      document: { type: 'doc', content: [{ type: 'calculatorBlock', attrs: { blockId, caption: 'Suction port bore in boss' } }] },
      version: 1,
      createdAt: '2026-12-01T10:00:00.000Z',
      updatedAt: '2026-12-01T10:00:00.000Z',
      createdBy: null,
      publishedAt: '2026-12-01T10:00:00.000Z',
      publishedBy: null,
      supersededAt: '2026-12-02T10:30:00.000Z',
      review: { submittedAt: null, submittedBy: null, reviewers: [], note: null, comment: null },
      restoredFromId: null,
    });
  }
  if (url.startsWith('/api/methods')) return jsonResponse(200, { items: [] });
  return jsonResponse(404, { statusCode: 404, code: 'NOT_FOUND', message: 'Not here' });
}

describe('RecordView', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows the page revision, block, reference, inputs, result and derivation, and that a later revision changes it', async () => {
    vi.stubGlobal('fetch', vi.fn(async (url: string) => answer(url)));
    render(<RecordView recordId={record.id} />);

    expect(await screen.findByRole('heading', { name: record.page.title })).toBeInTheDocument();
    expect(screen.getByText('Rev. A')).toBeInTheDocument();
    expect(await screen.findByText('Suction port bore in boss')).toBeInTheDocument();
    expect(screen.getByText('PH-2210-04')).toBeInTheDocument();
    expect(screen.getByText('D-88121 rev C')).toBeInTheDocument();
    // Without the method's description the values stand without a unit rather than with a guessed one.
    expect(screen.getByRole('table', { name: 'Inputs' })).toHaveTextContent('feature › upperLimit26.5');
    const derivation = screen.getByRole('heading', { name: 'Derivation' }).parentElement!;
    expect(derivation).toHaveTextContent('Minimum wall');
    expect(derivation).toHaveTextContent('1.6 mm');
    expect(await screen.findByTestId('record-impact')).toHaveTextContent('Under Rev. B of BW-STD-112');
    expect(screen.getByTestId('record-impact')).toHaveTextContent('comes out fail instead of pass');
    expect(screen.getByRole('button', { name: 'Download PDF' })).toBeEnabled();
  });

  it('says so when the link leads nowhere', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(404, { statusCode: 404, code: 'NOT_FOUND', message: 'No calculation record with this id.' })));
    render(<RecordView recordId="00000000-0000-4000-8000-000000000000" />);
    expect(await screen.findByRole('heading', { name: 'No such record' })).toBeInTheDocument();
  });
});
