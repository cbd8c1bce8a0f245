import { TextInput, type TextInputProps } from '@mantine/core';
import { useState } from 'react';
import { formatNumber, parseNumberText } from '@/components/calculator';

type Props = Omit<TextInputProps, 'value' | 'onChange'> & { value: number | null | undefined; onChange: (value: number | null) => void };

function toText(value: number | null | undefined): string {
  return typeof value === 'number' ? formatNumber(value).replace('−', '-') : '';
}

/** A number typed as text: what is typed stays on screen; the value follows once it reads as a number. */
export function NumberTextInput({ value, onChange, ...props }: Props) {
  const [text, setText] = useState(() => toText(value));
  const [shown, setShown] = useState(value);
  if (shown !== value) {
    setShown(value);
    if (parseNumberText(text) !== value && !(text.trim() === '' && value == null)) setText(toText(value));
  }
  return (
    <TextInput
      {...props}
      value={text}
      inputMode="decimal"
      autoComplete="off"
      spellCheck={false}
      onChange={(event) => {
        const next = event.currentTarget.value;
        setText(next);
        if (next.trim() === '') onChange(null);
        else {
          const parsed = parseNumberText(next);
          if (parsed !== null) onChange(parsed);
        }
      }}
    />
  );
}
