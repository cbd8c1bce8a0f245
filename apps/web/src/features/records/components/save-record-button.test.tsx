import { afterEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/lib/session';
import { jsonResponse, render, screen, within } from '@/testing/render';
import { SaveRecordButton } from './save-record-button';

const target = {
  pageId: '7c9e6679-7425-40de-944b-e07fc1f90ae7',
  revisionId: '3f2504e0-4f89-41d3-9a0c-0305e82c3301',
  documentNumber: 'BW-STD-112',
  revisionLetter: 'B',
  blockId: 'b73ad147-41ce-4527-968d-505fd6e1fe82',
  caption: 'Suction port bore',
};
const inputs = { feature: { lowerLimit: 19.9, upperLimit: 20.1 }, positionTolerance: 0.2 };

function dialog() {
  return within(screen.getByRole('dialog', { name: 'Save a calculation record' }));
}

describe('SaveRecordButton', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('waits for a current result before it can save', () => {
    render(<SaveRecordButton {...target} inputs={inputs} unit="mm" evaluated={false} />);
    expect(screen.getByRole('button', { name: 'Save record…' })).toBeDisabled();
  });

  it('posts the block, revision, inputs, unit and reference, and offers the permalink', async () => {
    session.signIn({ accessToken: 'reader-token', expiresIn: 900, user: { id: 'r', email: 'tomas.wren@brackwater.example', name: 'Tomas Wren', role: 'reader' } });
    const fetch = vi.fn(async () =>
      jsonResponse(201, {
        id: '9b2f0c1e-1111-4e22-8a33-444455556666',
        page: { id: target.pageId, documentNumber: 'BW-STD-112', title: 'Minimum wall' },
        revision: { id: target.revisionId, sequence: 2, revisionLetter: 'B', state: 'released' },
        blockId: target.blockId,
        method: 'wall-thickness',
        methodVersion: 1,
        unit: 'mm',
        inputs,
        outputs: { minWall: 4.8 },
        verdict: { pass: true, summary: 'Meets the rule', checks: [] },
        warnings: [],
        steps: [],
        acceptance: null,
        reference: { partNumber: 'PH-2210-04' },
        createdBy: { id: 'r', name: 'Tomas Wren', email: 'tomas.wren@brackwater.example' },
        createdAt: '2026-12-02T10:00:00.000Z',
      }),
    );
    vi.stubGlobal('fetch', fetch);
    const { user } = render(<SaveRecordButton {...target} inputs={inputs} unit="mm" evaluated />);

    await user.click(screen.getByRole('button', { name: 'Save record…' }));
    await user.type(dialog().getByLabelText('Part number'), '  PH-2210-04 ');
    await user.click(dialog().getByRole('button', { name: 'Save record' }));

    expect(await screen.findByText('Record saved')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Open the record' })).toBeInTheDocument();
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/records');
    // Empty reference fields are left out, the rest trimmed.
    expect(JSON.parse(String(init.body))).toEqual({ pageId: target.pageId, revisionId: target.revisionId, blockId: target.blockId, inputs, unit: 'mm', reference: { partNumber: 'PH-2210-04' } });
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
  });

  it('shows the server’s messages at the reference field and, for the inputs, in the dialog', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () =>
        jsonResponse(400, {
          statusCode: 400,
          code: 'VALIDATION_FAILED',
          message: 'The page fixes this input: positionTolerance.',
          fields: { 'reference.drawing': 'Drawing must be at most 100 characters', 'inputs.positionTolerance': 'Locked by the page; it cannot be changed' },
        }),
      ),
    );
    const { user } = render(<SaveRecordButton {...target} inputs={inputs} unit="mm" evaluated />);
    await user.click(screen.getByRole('button', { name: 'Save record…' }));
    await user.type(dialog().getByLabelText('Drawing'), 'D-1');
    await user.click(dialog().getByRole('button', { name: 'Save record' }));

    expect(await dialog().findByText('Drawing must be at most 100 characters')).toBeInTheDocument();
    expect(dialog().getByRole('alert')).toHaveTextContent('The page fixes this input: positionTolerance. Locked by the page; it cannot be changed.');
  });
});
