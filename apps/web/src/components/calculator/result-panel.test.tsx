import type { EvaluationResult, MethodSummary } from '@limitbook/contracts';
import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@/testing/render';
import { ResultPanel } from './result-panel';

const method: MethodSummary = {
  id: 'position-check',
  version: 1,
  title: 'Position check of measured features',
  description: '',
  references: [],
  cautions: ['Rotation of the pattern is not considered.'],
  inputSchema: {},
  outputs: [
    { name: 'features', label: 'Features', kind: 'table', description: 'Per feature results' },
    { name: 'datumShift', label: 'Datum feature shift available', kind: 'length', description: '' },
    { name: 'patternConforms', label: 'Pattern conforms', kind: 'boolean', description: '' },
  ],
};

const result: EvaluationResult = {
  method: 'position-check',
  version: 1,
  unit: 'mm',
  outputs: {
    features: [
      { label: 'H1', dx: 0.03, dy: 0.04, deviation: 0.1, actualSize: 10.05, sizeConforms: true, bonus: 0.05, allowed: 0.15, conformsAsMeasured: true, deviationWithShift: null },
      { label: 'H2', dx: -0.06, dy: 0.08, deviation: 0.2, actualSize: 10.05, sizeConforms: true, bonus: 0.05, allowed: 0.15, conformsAsMeasured: false, deviationWithShift: null },
    ],
    datumShift: 0,
    patternConforms: false,
  },
  verdict: { pass: false, summary: 'Pattern does not conform', checks: [] },
  warnings: [],
  steps: [],
};

describe('ResultPanel', () => {
  it('shows a table output as its own table with labelled columns, units and Yes/No', () => {
    render(<ResultPanel result={result} method={method} />);
    const table = screen.getByRole('table', { name: /Per feature results/ });
    const [header, , second] = within(table).getAllByRole('row');
    expect(header).toHaveTextContent('Feature');
    expect(header).toHaveTextContent('Position ⌀ (mm)');
    expect(header).toHaveTextContent('Allowed ⌀ (mm)');
    expect(second).toHaveTextContent('H2');
    const cells = within(second!).getAllByRole('cell');
    expect(cells.find((cell) => cell.textContent === 'No')).toHaveAttribute('data-fails');
    expect(cells.at(-1)).toHaveTextContent('—');
    // Not repeated as raw JSON among the scalar results.
    expect(within(screen.getByRole('table', { name: 'Results' })).queryByText(/"label"/)).not.toBeInTheDocument();
  });
});
