import { useState } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen, waitFor, within } from '@/testing/render';
import { MethodInputsForm } from './method-inputs-form';

// The shape zod emits for position-check's features table, trimmed to what the form reads.
const positionSchema = {
  type: 'object',
  properties: {
    positionTolerance: { type: 'number', minimum: 0 },
    features: {
      type: 'array',
      items: {
        type: 'object',
        properties: {
          label: { type: 'string', minLength: 1, maxLength: 40 },
          basicX: { type: 'number', description: 'Basic X, in the request unit.' },
          basicY: { type: 'number', description: 'Basic Y, in the request unit.' },
          measuredX: { type: 'number', description: 'Measured X, in the request unit.' },
          measuredY: { type: 'number', description: 'Measured Y, in the request unit.' },
          actualSize: { type: 'number', exclusiveMinimum: 0, description: 'Actual size, in the request unit.' },
        },
        required: ['label', 'basicX', 'basicY', 'measuredX', 'measuredY', 'actualSize'],
      },
    },
  },
  required: ['positionTolerance', 'features'],
};

const typed = { label: 'H1', basicX: 50, basicY: 0, measuredX: 50.01, measuredY: 0, actualSize: 10.1 };
const imported = [
  { label: 'A1', basicX: 60, basicY: 0, measuredX: 60.02, measuredY: 0.01, actualSize: 10.55 },
  { label: "=cmd|' /C calc'!A0", basicX: 0, basicY: 60, measuredX: 0.01, measuredY: 60.03, actualSize: 10.56 },
];

let answer: () => Response;
let requested: { url: string; body: unknown }[];

beforeEach(() => {
  requested = [];
  answer = () => jsonResponse(200, { unit: 'mm', columns: [], ignoredColumns: [], rows: imported, problems: [{ line: 4, field: 'measuredX', message: 'Measured X must be a number (read “abc”)' }] });
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      requested.push({ url: String(input), body: init?.body });
      return answer();
    }),
  );
});

afterEach(() => {
  vi.unstubAllGlobals();
});

function Controlled({ onChange, locked }: { onChange: (value: Record<string, unknown>) => void; locked?: string[] }) {
  const [value, setValue] = useState<Record<string, unknown>>({ positionTolerance: 0.1, features: [typed] });
  return (
    <MethodInputsForm
      schema={positionSchema}
      method="position-check"
      unit="mm"
      value={value}
      locked={locked}
      onChange={(next) => {
        setValue(next);
        onChange(next);
      }}
    />
  );
}

const csvFile = () => new File(['label,x,y\n'], 'holes.csv', { type: 'text/csv' });
const fileInput = (container: HTMLElement) => container.querySelector('input[type="file"]') as HTMLInputElement;

describe('CSV import on a table input', () => {
  it('replaces the rows with the good rows and lists the bad lines under the table', async () => {
    const onChange = vi.fn();
    const { user, container } = render(<Controlled onChange={onChange} />);
    expect(screen.getByRole('button', { name: 'Import CSV into Measured features' })).toBeInTheDocument();
    await user.upload(fileInput(container), csvFile());

    await waitFor(() => expect(onChange).toHaveBeenCalled());
    expect(requested[0]!.url).toMatch(/\/api\/methods\/position-check\/tables\/features\/import\?unit=mm$/);
    expect(requested[0]!.body).toBeInstanceOf(FormData);
    expect((onChange.mock.calls.at(-1)![0] as { features: unknown[] }).features).toEqual(imported);
    const table = screen.getByRole('table');
    // Header plus the two imported rows; the formula-like label is shown as typed text.
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    expect(within(table).getByRole('textbox', { name: "Label, =cmd|' /C calc'!A0" })).toHaveValue("=cmd|' /C calc'!A0");
    expect(screen.getByRole('status')).toHaveTextContent('2 rows imported from holes.csv (table replaced); 1 left out:');
    const problems = screen.getByLabelText('Rows left out of the import');
    expect(problems).toHaveTextContent('Line 4');
    expect(problems).toHaveTextContent('measuredX');
    expect(problems).toHaveTextContent('Measured X must be a number (read “abc”)');
  });

  it('appends when asked to', async () => {
    const onChange = vi.fn();
    const { user, container } = render(<Controlled onChange={onChange} />);
    await user.click(screen.getByRole('radio', { name: 'Append rows' }));
    await user.upload(fileInput(container), csvFile());
    await waitFor(() => expect(onChange).toHaveBeenCalled());
    expect((onChange.mock.calls.at(-1)![0] as { features: unknown[] }).features).toEqual([typed, ...imported]);
    expect(screen.getByRole('status')).toHaveTextContent('(appended)');
  });

  it('shows a refused file at the table and keeps the rows', async () => {
    answer = () => jsonResponse(413, { statusCode: 413, code: 'PAYLOAD_TOO_LARGE', message: 'CSV imports may be at most 1 MB.', fields: { file: 'Larger than 1 MB' } });
    const onChange = vi.fn();
    const { user, container } = render(<Controlled onChange={onChange} />);
    await user.upload(fileInput(container), csvFile());
    expect(await screen.findByRole('alert')).toHaveTextContent('Larger than 1 MB');
    expect(onChange).not.toHaveBeenCalled();
    expect(within(screen.getByRole('table')).getAllByRole('row')).toHaveLength(2);
  });

  it('offers no import on a locked table or a method without importable tables', () => {
    render(<Controlled onChange={() => {}} locked={['features']} />);
    expect(screen.queryByRole('button', { name: /Import CSV/ })).not.toBeInTheDocument();
  });

  it('names a new row in the label column', async () => {
    const onChange = vi.fn();
    const { user } = render(<Controlled onChange={onChange} />);
    await user.click(screen.getByRole('button', { name: 'Add feature' }));
    expect((onChange.mock.calls.at(-1)![0] as { features: { label: string }[] }).features.map((row) => row.label)).toEqual(['H1', 'Feature 2']);
  });
});
