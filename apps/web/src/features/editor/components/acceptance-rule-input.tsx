import { Autocomplete } from '@mantine/core';
import { formatAcceptanceRule, parseAcceptanceRule, type AcceptanceRule } from '@limitbook/editor-schema';
import type { OutputDescription } from '@limitbook/contracts';
import { useState } from 'react';

type Props = {
  value: AcceptanceRule | null;
  outputs: readonly OutputDescription[];
  unit: 'mm' | 'in';
  onChange: (rule: AcceptanceRule | null) => void;
  disabled?: boolean;
};

// Only outputs that can be compared with a number make sense in a rule.
const comparableKinds = new Set(['length', 'number', 'percent']);

/**
 * The acceptance rule as one line of text (`minWall >= 1.5 mm`). The block's attribute
 * changes only when the text reads as a rule; otherwise the message shows at the field.
 */
export function AcceptanceRuleInput({ value, outputs, unit, onChange, disabled }: Props) {
  const [text, setText] = useState(() => (value ? formatAcceptanceRule(value) : ''));
  const [error, setError] = useState<string | null>(null);
  const [shown, setShown] = useState(value);
  // Undo, a reload or another author's copy can change the rule under the field.
  if (value !== shown) {
    setShown(value);
    const current = parseAcceptanceRule(text);
    if (!(current.ok && value && formatAcceptanceRule(current.rule) === formatAcceptanceRule(value))) {
      setText(value ? formatAcceptanceRule(value) : '');
      setError(null);
    }
  }

  const comparable = outputs.filter((output) => comparableKinds.has(output.kind));
  const names = new Set(outputs.map((output) => output.name));
  const typedName = /^\s*([A-Za-z_][\w.]*)\s*$/.exec(text)?.[1];
  const suggestions =
    typedName === undefined && text.trim() !== ''
      ? []
      : comparable.map((output) => ({ value: `${output.name} >= `, label: `${output.name} — ${output.label}` }));

  const apply = (next: string) => {
    setText(next);
    if (next.trim() === '') {
      setError(null);
      if (value !== null) onChange(null);
      return;
    }
    const parsed = parseAcceptanceRule(next);
    if (!parsed.ok) {
      setError(parsed.message);
      return;
    }
    if (names.size > 0 && !names.has(parsed.rule.output.split('.')[0] ?? '')) {
      setError(`${parsed.rule.output} is not an output of this method. Try ${comparable.map((output) => output.name).join(', ')}`);
      return;
    }
    setError(null);
    onChange(parsed.rule);
  };

  return (
    <Autocomplete
      label="Acceptance rule"
      description={`The verdict readers see, e.g. ${comparable[0]?.name ?? 'minWall'} >= 1.5 ${unit}. Leave empty for no verdict.`}
      placeholder={`${comparable[0]?.name ?? 'minWall'} >= 1.5 ${unit}`}
      value={text}
      data={suggestions.map((option) => option.value)}
      renderOption={({ option }) => suggestions.find((candidate) => candidate.value === option.value)?.label ?? option.value}
      filter={({ options, search }) => {
        const needle = search.trim().toLowerCase();
        return options.filter((option) => 'value' in option && option.value.toLowerCase().startsWith(needle));
      }}
      onChange={apply}
      error={error}
      disabled={disabled}
      spellCheck={false}
      autoComplete="off"
    />
  );
}
