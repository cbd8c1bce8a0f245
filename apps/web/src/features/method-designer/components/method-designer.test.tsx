import type { MethodRevision } from '@limitbook/contracts';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { session } from '@/lib/session';
import { jsonResponse, render, screen, waitFor } from '@/testing/render';
import { MethodDesigner } from './method-designer';

const review = { submittedAt: null, submittedBy: null, reviewers: [], note: null, comment: null };

function revision(expression: string): MethodRevision {
  return {
    id: 'rev-1',
    methodId: 'm-1',
    state: 'draft',
    methodVersion: null,
    version: 2,
    definition: {
      name: 'Gland squeeze',
      description: '',
      inputs: [
        { name: 'cord', label: 'Cord', kind: 'length', unit: 'mm', default: 3.53, min: null, max: null, help: '' },
        { name: 'depth', label: 'Depth', kind: 'length', unit: 'mm', default: 2.8, min: null, max: null, help: '' },
      ],
      intermediates: [],
      outputs: [{ name: 'squeeze', label: 'Squeeze', expression, unit: '', decimals: 2 }],
      checks: [{ expression: 'squeeze >= 15', message: 'At least 15 %' }],
      references: [],
      cautions: [],
      safetyCritical: false,
      tests: [{ label: 'nominal', inputs: { cord: 3.53, depth: 2.8 }, expected: { squeeze: { value: 20.68, tolerance: 0 } }, expectedVerdict: 'pass' }],
    },
    createdAt: '2026-12-01T09:00:00.000Z',
    createdBy: null,
    updatedAt: '2026-12-01T09:00:00.000Z',
    updatedBy: null,
    releasedAt: null,
    approvedBy: null,
    supersededAt: null,
    review,
    restoredFromVersion: null,
    problems: {},
    tex: {},
  };
}

// (3.53 − 2.80) / 3.53 = 20.68 % (Parker O-Ring Handbook ORD 5700, gland design; from memory).
const result = { method: 'preview', version: 0, unit: 'mm', outputs: { squeeze: { value: 20.6799, unit: '', text: '20.68', label: 'Squeeze' } }, warnings: [], steps: [], verdict: { pass: true, summary: '1 of 1 checks hold', checks: [] } };

describe('MethodDesigner', () => {
  beforeEach(() => session.signIn({ accessToken: 't', expiresIn: 900, user: { id: 'u1', email: 'idris.okafor@brackwater.example', name: 'Idris Okafor', role: 'author' } }));
  afterEach(() => vi.unstubAllGlobals());

  it('puts the preview’s refusal at the expression it concerns and keeps review closed', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => jsonResponse(400, { statusCode: 400, code: 'VALIDATION_FAILED', message: 'dept is not defined', fields: { 'definition.outputs.0.expression': 'dept is not defined' } })),
    );
    render(<MethodDesigner slug="gland-squeeze" revision={revision('100 * (cord - dept) / cord')} />);
    const field = screen.getByRole('textbox', { name: 'Expression for squeeze' });
    await waitFor(() => expect(field).toHaveAttribute('aria-invalid', 'true'), { timeout: 3000 });
    expect(screen.getAllByText('dept is not defined').length).toBeGreaterThan(0);
    expect(screen.getByRole('button', { name: 'Submit for review' })).toBeDisabled();
    expect(screen.getByTestId('submit-blocker')).toHaveTextContent('fix the message at the fields first');
  });

  it('opens review once a run of the table as it stands passes, with the typeset formula from the server', async () => {
    const fetch = vi.fn(async (input: RequestInfo | URL) => {
      const url = String(input);
      if (url.endsWith('/preview')) return jsonResponse(200, { result, tex: { 'outputs.0.expression': '\\frac{100 (cord - depth)}{cord}' } });
      if (url.endsWith('/draft/run-tests')) {
        return jsonResponse(200, { pass: true, passed: 1, failed: 0, rows: [{ index: 0, label: 'nominal', pass: true, outputs: [{ output: 'squeeze', expected: 20.68, tolerance: 0, actual: 20.6799, difference: 0.0001, unit: '', pass: true }], expectedVerdict: 'pass', verdict: 'pass', errors: {} }] });
      }
      return jsonResponse(404, { statusCode: 404, code: 'NOT_FOUND', message: 'Not found' });
    });
    vi.stubGlobal('fetch', fetch);
    const { user } = render(<MethodDesigner slug="gland-squeeze" revision={revision('100 * (cord - depth) / cord')} />);
    expect(await screen.findByText('Up to date', {}, { timeout: 3000 })).toBeInTheDocument();
    expect(document.querySelector('[data-tex-for="outputs.0.expression"]')).not.toBeNull();
    expect(screen.getByRole('button', { name: 'Submit for review' })).toBeDisabled();

    await user.click(screen.getByRole('button', { name: 'Run tests' }));
    expect(await screen.findByText('All 1 row passes.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Submit for review' })).toBeEnabled();

    // Any change after the run asks for a new one.
    await user.type(screen.getByRole('textbox', { name: /^Description/ }), 'x');
    expect(await screen.findByText('The definition changed since the last run: run the tests again.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Submit for review' })).toBeDisabled();
  });
});
