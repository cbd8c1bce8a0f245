import { describe, expect, it } from 'vitest';
import { render, screen } from '@/testing/render';
import { OutputValue } from './output-value';

describe('OutputValue', () => {
  it('shows an in-house output at the decimals its author declared, not every digit the server kept', () => {
    // (3.53 − 2.80) / 3.53 × 100 = 20.6798… %, declared with 2 decimals.
    render(<OutputValue description={undefined} value={{ value: 20.67988669, unit: '', text: '20.68', label: 'Squeeze' }} unit="mm" />);
    expect(screen.getByText('20.68')).toBeInTheDocument();
    expect(screen.queryByText(/20\.6798/)).toBeNull();
  });

  it('keeps trailing zeros and the unit of the declared display', () => {
    render(
      <p data-testid="shown">
        <OutputValue description={undefined} value={{ value: -0.5, unit: 'mm', text: '-0.500 mm', label: 'Gap' }} unit="mm" />
      </p>,
    );
    expect(screen.getByTestId('shown').textContent).toBe('\u22120.500\u00a0mm');
  });
});
