import type { OutputDescription } from '@limitbook/contracts';
import { outputKeyLabel, outputKeyUnit } from './lib/field-meta';
import { formatNumber } from './lib/format-number';
import classes from './result-panel.module.css';

export function Quantity({ value, unit }: { value: number; unit?: string }) {
  return (
    <span className={classes.quantity}>
      <span className={classes.number}>{formatNumber(value)}</span>
      {unit ? <span className={classes.quantityUnit}>{unit === '%' ? '%' : `\u00a0${unit}`}</span> : null}
    </span>
  );
}

function isFormulaQuantity(value: unknown): value is { value: number; unit: string | null; text?: string } {
  return !!value && typeof value === 'object' && 'value' in value && typeof (value as { value: unknown }).value === 'number' && 'unit' in value;
}

function Scalar({ value, unit, keyName }: { value: unknown; unit: string; keyName?: string }) {
  if (value === null || value === undefined) return <span className={classes.muted}>—</span>;
  if (typeof value === 'number') return <Quantity value={value} unit={keyName ? outputKeyUnit(keyName, unit) : unit} />;
  if (typeof value === 'boolean') return <span>{value ? 'Yes' : 'No'}</span>;
  if (typeof value === 'string') return <span>{value}</span>;
  return <span className={classes.mono}>{JSON.stringify(value)}</span>;
}

/** One output of a result, by the kind the catalog gives it. */
export function OutputValue({ description, value, unit }: { description: OutputDescription | undefined; value: unknown; unit: string }) {
  const kind = description?.kind;
  if (isFormulaQuantity(value)) {
    // In-house outputs carry the text rounded to the decimals their author declared; show that, not every digit.
    const rounded = typeof value.text === 'string' ? /^-?\d+(\.\d+)?/.exec(value.text.trim())?.[0] : undefined;
    if (rounded) {
      return (
        <span className={classes.quantity}>
          <span className={classes.number}>{rounded.replace('-', '\u2212')}</span>
          {value.unit ? <span className={classes.quantityUnit}>{`\u00a0${value.unit}`}</span> : null}
        </span>
      );
    }
    return <Quantity value={value.value} unit={value.unit ?? undefined} />;
  }
  if (typeof value === 'number') {
    const shownUnit = kind === 'length' ? unit : kind === 'percent' ? '%' : '';
    // A negative clearance is an interference; say so rather than leave the sign to be read.
    if (kind === 'length' && value < 0 && /clearance/i.test(description?.name ?? '')) {
      return (
        <span>
          <Quantity value={value} unit={shownUnit} /> <span className={classes.muted}>(interference {formatNumber(-value)}&nbsp;{unit})</span>
        </span>
      );
    }
    return <Quantity value={value} unit={shownUnit} />;
  }
  if (value && typeof value === 'object' && !Array.isArray(value)) {
    const entries = Object.entries(value as Record<string, unknown>).filter(([key]) => key !== 'histogram');
    return (
      <dl className={classes.pairs}>
        {entries.map(([key, item]) => (
          <div key={key} className={classes.pair}>
            <dt>{outputKeyLabel(key)}</dt>
            <dd>
              {item && typeof item === 'object' && !Array.isArray(item) ? (
                <span className={classes.range}>
                  {Object.entries(item as Record<string, unknown>).map(([innerKey, inner], index) => (
                    <span key={innerKey}>
                      {index > 0 ? ', ' : ''}
                      {outputKeyLabel(innerKey).toLowerCase()} <Scalar value={inner} unit={unit} keyName={innerKey} />
                    </span>
                  ))}
                </span>
              ) : (
                <Scalar value={item} unit={unit} keyName={key} />
              )}
            </dd>
          </div>
        ))}
      </dl>
    );
  }
  return <Scalar value={value} unit={kind === 'length' ? unit : ''} />;
}
