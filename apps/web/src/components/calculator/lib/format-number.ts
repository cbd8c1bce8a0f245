const superscripts: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/**
 * A number as an engineer reads it: no float noise (0.1 + 0.2 shows as 0.3), a true minus
 * sign, and tiny or huge magnitudes in scientific notation.
 */
export function formatNumber(value: number, significant = 10): string {
  if (!Number.isFinite(value)) return Number.isNaN(value) ? '—' : value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude < 1e-6 || magnitude >= 1e12) {
    const [mantissa = '', exponent = '0'] = value.toExponential(2).split('e');
    const cleanMantissa = String(Number(mantissa)).replace('-', '−');
    const power = String(Number(exponent)).replace(/./g, (char) => superscripts[char] ?? char);
    return `${cleanMantissa} × 10${power}`;
  }
  const text = String(Number(value.toPrecision(significant)));
  return text.replace('-', '−');
}

/** Reads what a person typed into a number field: a decimal point or comma, an optional minus sign. */
export function parseNumberText(text: string): number | null {
  const cleaned = text.trim().replace(/\s+/g, '').replace(',', '.').replace('−', '-');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}
