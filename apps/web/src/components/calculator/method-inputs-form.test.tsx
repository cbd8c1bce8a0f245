import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { render, screen, within } from '@/testing/render';
import { MethodInputsForm } from './method-inputs-form';

// The shapes zod emits for the wall-thickness and stack-up methods, trimmed to what the form must handle.
const wallSchema = {
  type: 'object',
  properties: {
    arrangement: { type: 'string', enum: ['coaxial', 'side-by-side'] },
    basicDistance: { description: 'Side by side only: basic distance between the axes', type: ['number', 'null'] },
    feature: {
      type: 'object',
      properties: {
        featureType: { type: 'string', enum: ['internal', 'external'] },
        lowerLimit: { type: 'number', exclusiveMinimum: 0 },
        upperLimit: { type: 'number', exclusiveMinimum: 0 },
      },
      required: ['featureType', 'lowerLimit', 'upperLimit'],
      description: 'The located feature of size',
    },
    positionTolerance: { type: 'number', minimum: 0 },
    toleranceModifier: { type: 'string', enum: ['MMC', 'LMC', 'RFS'] },
    datumModifier: { anyOf: [{ type: 'string', enum: ['MMB', 'LMB', 'RMB'] }, { type: 'null' }] },
  },
  required: ['arrangement', 'feature', 'positionTolerance', 'toleranceModifier'],
};

const stackSchema = {
  type: 'object',
  properties: {
    contributors: {
      type: 'array',
      items: {
        type: 'object',
        properties: {
          name: { type: 'string', minLength: 1 },
          sense: { anyOf: [{ type: 'number', const: 1 }, { type: 'number', const: -1 }] },
          nominal: { type: 'number' },
          plusTol: { type: 'number' },
          minusTol: { type: 'number' },
          distribution: { default: 'normal', type: 'string', enum: ['normal', 'uniform', 'triangular'] },
        },
        required: ['name', 'sense', 'nominal', 'plusTol', 'minusTol'],
      },
    },
    trials: { type: 'integer', minimum: 1000, default: 100000 },
  },
  required: ['contributors'],
};

const wallValue = {
  arrangement: 'coaxial',
  feature: { featureType: 'internal', lowerLimit: 19.9, upperLimit: 20.1 },
  positionTolerance: 0.2,
  toleranceModifier: 'LMC',
  datumModifier: 'LMB',
};

function Controlled({ initial, onChange, ...props }: { initial: Record<string, unknown>; onChange?: (value: Record<string, unknown>) => void } & Omit<Parameters<typeof MethodInputsForm>[0], 'value' | 'onChange'>) {
  const [value, setValue] = useState(initial);
  return (
    <MethodInputsForm
      {...props}
      value={value}
      onChange={(next) => {
        setValue(next);
        onChange?.(next);
      }}
    />
  );
}

describe('MethodInputsForm', () => {
  it('renders nested objects as fieldsets, enums as choices and lengths with their unit', async () => {
    const onChange = vi.fn();
    const { user } = render(<Controlled schema={wallSchema} method="wall-thickness" initial={wallValue} unit="mm" onChange={onChange} />);

    const feature = screen.getByRole('group', { name: /Located feature/ });
    const lower = within(feature).getByRole('textbox', { name: /Lower limit of size/ });
    expect(lower).toHaveValue('19.9');
    expect(within(feature).getAllByText('mm').length).toBeGreaterThan(0);
    expect(screen.getByRole('radio', { name: 'Side by side' })).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: 'LMC' })).toBeChecked();
    // A nullable choice offers "None".
    expect(screen.getByRole('radio', { name: 'None' })).toBeInTheDocument();

    await user.clear(lower);
    await user.type(lower, '19,8');
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ feature: expect.objectContaining({ lowerLimit: 19.8 }) }));

    await user.click(screen.getByRole('radio', { name: 'MMC' }));
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ toleranceModifier: 'MMC' }));
  });

  it('shows locked inputs read-only with the reason', async () => {
    const { user } = render(<Controlled schema={wallSchema} initial={wallValue} unit="in" locked={['positionTolerance', 'feature']} />);
    expect(screen.getByRole('textbox', { name: /Position tolerance/ })).toHaveAttribute('readonly');
    // Locking an object locks what is inside it.
    expect(screen.getByRole('textbox', { name: /Upper limit of size/ })).toHaveAttribute('readonly');
    expect(screen.getByRole('textbox', { name: /Basic distance/ })).not.toHaveAttribute('readonly');
    const locks = screen.getAllByRole('img', { name: 'Set by the standard' });
    expect(locks.length).toBeGreaterThanOrEqual(2);
    await user.hover(locks[0] as HTMLElement);
    expect(await screen.findByRole('tooltip')).toHaveTextContent('Set by the standard');
  });

  it('puts a server field error at its field and the rest above the form', () => {
    render(
      <MethodInputsForm
        schema={wallSchema}
        value={wallValue}
        onChange={() => {}}
        unit="mm"
        errors={{ 'inputs.feature.lowerLimit': 'Lower limit must not exceed the upper limit', 'inputs.mystery': 'Not a known input' }}
      />,
    );
    const lower = screen.getByRole('textbox', { name: /Lower limit of size/ });
    expect(lower).toHaveAttribute('aria-invalid', 'true');
    expect(lower).toHaveAccessibleDescription(/Lower limit must not exceed the upper limit/);
    expect(screen.getByRole('textbox', { name: /Upper limit of size/ })).not.toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText(/Not a known input/)).toBeInTheDocument();
  });

  it('edits an array of records as a table with rows to add and remove', async () => {
    const onChange = vi.fn();
    const initial = {
      contributors: [
        { name: 'Housing', sense: 1, nominal: 40, plusTol: 0.05, minusTol: 0.05, distribution: 'normal' },
        { name: 'Cover', sense: -1, nominal: 4, plusTol: 0.03, minusTol: 0.03 },
      ],
    };
    const { user } = render(<Controlled schema={stackSchema} initial={initial} unit="mm" onChange={onChange} locked={['contributors.0.nominal']} />);
    const table = screen.getByRole('table');
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    expect(within(table).getByRole('textbox', { name: 'Nominal, Housing' })).toHaveAttribute('readonly');
    const coverPlus = within(table).getByRole('textbox', { name: '+ Tol, Cover' });
    await user.clear(coverPlus);
    await user.type(coverPlus, '0.04');
    expect(onChange).toHaveBeenLastCalledWith({ contributors: [initial.contributors[0], { ...initial.contributors[1], plusTol: 0.04 }] });

    await user.click(screen.getByRole('button', { name: 'Add contributor' }));
    expect(within(table).getAllByRole('row')).toHaveLength(4);
    await user.click(screen.getByRole('button', { name: 'Remove Cover' }));
    const last = onChange.mock.calls.at(-1)?.[0] as { contributors: { name: string }[] };
    expect(last.contributors.map((row) => row.name)).toEqual(['Housing', 'Contributor 3']);
  });

  it('places an error on a table cell', () => {
    render(
      <MethodInputsForm
        schema={stackSchema}
        value={{ contributors: [{ name: 'Spacer', sense: 1, nominal: 15.8, plusTol: -0.02, minusTol: 0.02 }] }}
        onChange={() => {}}
        unit="mm"
        errors={{ 'inputs.contributors.0.plusTol': 'Plus tolerance is a magnitude' }}
      />,
    );
    expect(screen.getByRole('textbox', { name: '+ Tol, Spacer' })).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('Plus tolerance is a magnitude')).toBeInTheDocument();
  });
});
