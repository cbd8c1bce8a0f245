import { ActionIcon, Tooltip } from '@mantine/core';
import type { LengthUnit, MethodSummary } from '@limitbook/contracts';
import { IconLock, IconLockOpen } from '@tabler/icons-react';
import { MethodInputsForm } from '@/components/calculator/method-inputs-form';
import { useMemo } from 'react';
import { hasDefault, inputLeaves } from '../lib/input-paths';
import classes from './calculator-block-view.module.css';

type Props = {
  method: MethodSummary;
  unit: LengthUnit;
  value: Record<string, unknown>;
  locked: string[];
  errors: Record<string, string>;
  onChange: (defaults: Record<string, unknown>) => void;
  onLockedChange: (locked: string[]) => void;
};

/**
 * The block's default inputs, each with a lock the author can toggle: readers see a locked
 * input but cannot change it. Only an input with a default can be locked.
 */
export function BlockDefaultsForm({ method, unit, value, locked, errors, onChange, onLockedChange }: Props) {
  const labels = useMemo(() => new Map(inputLeaves(method.inputSchema).map((leaf) => [leaf.path, leaf.label])), [method.inputSchema]);
  const lockAction = (path: string) => {
    const isLocked = locked.includes(path);
    const available = isLocked || hasDefault(value, path);
    const name = labels.get(path) ?? path;
    const label = isLocked ? `Unlock ${name} for readers` : available ? `Lock ${name} for readers` : `Set a default for ${name} before locking it`;
    return (
      <Tooltip label={isLocked ? 'Locked: readers cannot change it' : available ? 'Lock for readers' : 'Set a default first'}>
        <ActionIcon
          size="xs"
          variant={isLocked ? 'filled' : 'subtle'}
          color={isLocked ? 'ink' : 'gray'}
          aria-label={label}
          aria-pressed={isLocked}
          disabled={!available}
          className={classes.lockToggle}
          onClick={(event) => {
            event.preventDefault();
            event.stopPropagation();
            onLockedChange(isLocked ? locked.filter((item) => item !== path) : [...locked, path]);
          }}
        >
          {isLocked ? <IconLock size={12} /> : <IconLockOpen size={12} />}
        </ActionIcon>
      </Tooltip>
    );
  };

  return (
    <MethodInputsForm
      schema={method.inputSchema}
      method={method.id}
      unit={unit}
      value={value}
      onChange={onChange}
      errors={errors}
      renderFieldAction={lockAction}
    />
  );
}
