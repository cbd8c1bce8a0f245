import { SegmentedControl } from '@mantine/core';
import { lengthUnits, type LengthUnit } from '@limitbook/contracts';

/** Millimetres or inches for a calculator's lengths. */
export function UnitToggle({ value, onChange, disabled }: { value: LengthUnit; onChange: (unit: LengthUnit) => void; disabled?: boolean }) {
  return (
    <SegmentedControl
      size="xs"
      aria-label="Unit of length"
      data={lengthUnits.map((unit) => ({ value: unit, label: unit }))}
      value={value}
      onChange={(next) => onChange(next as LengthUnit)}
      disabled={disabled}
    />
  );
}
