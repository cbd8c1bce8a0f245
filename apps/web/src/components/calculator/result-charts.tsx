import { BarChart, LineChart } from '@mantine/charts';
import { Text } from '@mantine/core';
import type { AcceptanceRule, EvaluationResult } from '@limitbook/contracts';
import { formatNumber } from './lib/format-number';
import { convertLength } from './lib/units';
import classes from './result-charts.module.css';

type Sweep = { featureSizes: number[]; series: { datumSize: number; minWall: number[]; maxWall: number[] }[] };
type HistogramBin = { from: number; to: number; count: number };

function isSweep(value: unknown): value is Sweep {
  const sweep = value as Sweep | undefined;
  return !!sweep && Array.isArray(sweep.featureSizes) && Array.isArray(sweep.series) && sweep.series.length > 0;
}

function isHistogram(value: unknown): value is HistogramBin[] {
  return Array.isArray(value) && value.length > 0 && typeof (value[0] as HistogramBin).count === 'number';
}

// Enough figures to tell neighbouring sizes and bins apart, no more.
const tick = (value: number) => formatNumber(Number(value.toPrecision(5)));

function WallSweepChart({ sweep, unit, acceptance }: { sweep: Sweep; unit: string; acceptance?: AcceptanceRule | null }) {
  const first = sweep.series[0] as Sweep['series'][number];
  const last = sweep.series.at(-1) as Sweep['series'][number];
  const extremes = first === last ? [first] : [first, last];
  const series = extremes.flatMap((entry, index) => [
    { name: `min${index}`, label: `Minimum wall, datum ${tick(entry.datumSize)} ${unit}`, color: index === 0 ? 'redline.6' : 'redline.8', strokeDasharray: index === 0 ? undefined : '6 3' },
    { name: `max${index}`, label: `Maximum wall, datum ${tick(entry.datumSize)} ${unit}`, color: index === 0 ? 'ink.5' : 'ink.8', strokeDasharray: index === 0 ? undefined : '6 3' },
  ]);
  const data = sweep.featureSizes.map((size, position) => {
    const row: Record<string, number> = { size };
    extremes.forEach((entry, index) => {
      row[`min${index}`] = entry.minWall[position] as number;
      row[`max${index}`] = entry.maxWall[position] as number;
    });
    return row;
  });
  const limit =
    acceptance && (acceptance.output === 'minWall' || acceptance.output === 'maxWall') && acceptance.operator !== 'between'
      ? convertLength(acceptance.value, (acceptance.unit ?? unit) as 'mm' | 'in', unit as 'mm' | 'in')
      : null;

  return (
    <figure className={classes.figure}>
      <figcaption className={classes.caption}>
        Wall over the located feature&rsquo;s produced size ({unit}), with the datum feature at its smallest and largest size
      </figcaption>
      <LineChart
        h={260}
        data={data}
        dataKey="size"
        series={series}
        curveType="linear"
        withDots={false}
        xAxisProps={{ tickFormatter: (value: number) => tick(value) }}
        yAxisProps={{ domain: ['auto', 'auto'], tickFormatter: (value: number) => tick(value), width: 56 }}
        valueFormatter={(value) => `${formatNumber(value)} ${unit}`}
        xAxisLabel={`Located feature size (${unit})`}
        yAxisLabel={`Wall (${unit})`}
        referenceLines={limit === null ? [] : [{ y: limit, label: `Limit ${formatNumber(limit)} ${unit}`, color: 'redline.9' }]}
        gridAxis="xy"
        strokeWidth={2}
      />
      <ul className={classes.legend}>
        {series.map((item) => (
          <li key={item.name}>
            <svg width="22" height="8" aria-hidden="true">
              <line x1="0" y1="4" x2="22" y2="4" stroke={`var(--mantine-color-${item.color.replace('.', '-')})`} strokeWidth="2.5" strokeDasharray={item.strokeDasharray} />
            </svg>
            {item.label}
          </li>
        ))}
      </ul>
    </figure>
  );
}

function HistogramChart({ bins, unit, trials }: { bins: HistogramBin[]; unit: string; trials: number | undefined }) {
  const data = bins.map((bin) => ({ centre: tick((bin.from + bin.to) / 2), count: bin.count }));
  return (
    <figure className={classes.figure}>
      <figcaption className={classes.caption}>
        Monte Carlo distribution of the result{trials ? ` (${trials.toLocaleString('en-GB')} trials)` : ''}, {unit}
      </figcaption>
      <BarChart
        h={240}
        data={data}
        dataKey="centre"
        series={[{ name: 'count', label: 'Trials', color: 'ink.6' }]}
        barProps={{ isAnimationActive: false }}
        xAxisProps={{ interval: 'preserveStartEnd', minTickGap: 24 }}
        yAxisProps={{ width: 56 }}
        xAxisLabel={`Result (${unit})`}
        yAxisLabel="Trials"
        valueFormatter={(value) => value.toLocaleString('en-GB')}
        gridAxis="y"
      />
    </figure>
  );
}

/** Charts for results that carry a sweep (wall) or a histogram (stack Monte Carlo). Loaded on demand. */
export function ResultCharts({ result, acceptance }: { result: EvaluationResult; acceptance?: AcceptanceRule | null }) {
  const sweep = result.outputs.sweep;
  const monteCarlo = result.outputs.monteCarlo as { histogram?: unknown; trials?: number } | undefined;
  return (
    <>
      {isSweep(sweep) && <WallSweepChart sweep={sweep} unit={result.unit} acceptance={acceptance} />}
      {isHistogram(monteCarlo?.histogram) && <HistogramChart bins={monteCarlo.histogram} unit={result.unit} trials={monteCarlo.trials} />}
      {!isSweep(sweep) && !isHistogram(monteCarlo?.histogram) && (
        <Text size="sm" c="dimmed">
          No chart for this result.
        </Text>
      )}
    </>
  );
}
