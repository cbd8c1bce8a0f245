import { Alert, Badge, Button, Collapse, Group, Loader, Paper, Text } from '@mantine/core';
import { isHouseMethodId, type LengthUnit, type MethodSummary } from '@limitbook/contracts';
import type { CalculatorBlockAttrs } from '@limitbook/editor-schema';
import { IconAlertTriangle, IconChevronDown, IconCircleCheck, IconRestore, IconRuler2 } from '@tabler/icons-react';
import { useMemo, useState, type ReactNode } from 'react';
import { type EvaluationRequest } from './api/evaluate';
import { DerivationSteps } from './derivation-steps';
import { acceptanceInWords, ruleForRequest } from './lib/acceptance-words';
import type { EvaluationState } from './lib/evaluation-state';
import { describeInputs, hasLengthInput } from './lib/json-schema';
import { convertInputs } from './lib/units';
import { MethodInputsForm } from './method-inputs-form';
import { ResultPanel } from './result-panel';
import { UnitToggle } from './unit-toggle';
import { useBlockEvaluation } from './use-block-evaluation';
import classes from './calculator-block-view.module.css';

/** The attributes of a calculator block that the reader's view needs. */
export type CalculatorBlockConfig = Pick<CalculatorBlockAttrs, 'blockId' | 'method' | 'methodVersion' | 'unit' | 'defaults' | 'locked' | 'acceptance' | 'caption'>;

/** The request a block makes with its own defaults: a page batches these on load. */
export function blockRequest(block: CalculatorBlockConfig, method: MethodSummary | undefined, inputs = block.defaults as Record<string, unknown>, unit: LengthUnit = block.unit): EvaluationRequest {
  // An in-house method runs at the version the block is pinned to; built-ins have one version on the server.
  const methodVersion = isHouseMethodId(block.method) ? block.methodVersion : null;
  return { method: block.method, inputs, unit, acceptance: ruleForRequest(block.acceptance, block.unit, method), methodVersion };
}

const stateLabels: Record<EvaluationState, string> = {
  loading: 'Evaluating…',
  updating: 'Updating…',
  current: 'Up to date',
  error: 'Not evaluated',
};

function StatusLabel({ state }: { state: EvaluationState }) {
  return (
    <span className={classes.status} data-status={state} role="status">
      {state === 'loading' || state === 'updating' ? <Loader size={12} color="ink.6" /> : state === 'current' ? <IconCircleCheck size={14} /> : <IconAlertTriangle size={14} />}
      {stateLabels[state]}
    </span>
  );
}

export type CalculatorBlockViewProps = {
  block: CalculatorBlockConfig;
  /** The method from the catalog; undefined while loading or when the server does not know it. */
  method: MethodSummary | undefined;
  /** Whether the catalog has loaded (so a missing method is really missing). */
  catalogLoaded?: boolean;
  /** False holds evaluation back, e.g. until the page's batch has answered. */
  evaluationEnabled?: boolean;
  /** Actions beside the result (e.g. saving it as a record), given what the reader has entered. */
  resultActions?: (current: { inputs: Record<string, unknown>; unit: LengthUnit; evaluated: boolean }) => ReactNode;
};

/**
 * A live calculator block: the standard's inputs (locked ones read-only), evaluated on the
 * server as they change, with the verdict against the standard's acceptance rule, the
 * outputs, warnings, cautions, the derivation and a chart where the method gives one.
 */
export function CalculatorBlockView({ block, method, catalogLoaded = true, evaluationEnabled = true, resultActions }: CalculatorBlockViewProps) {
  const defaults = block.defaults as Record<string, unknown>;
  const [inputs, setInputs] = useState<Record<string, unknown>>(defaults);
  const [unit, setUnit] = useState<LengthUnit>(block.unit);
  const [showSteps, setShowSteps] = useState(false);
  const fields = useMemo(() => (method ? describeInputs(method.inputSchema, method.id) : []), [method]);

  const request = blockRequest(block, method, inputs, unit);
  const view = useBlockEvaluation(request, { enabled: evaluationEnabled && !!method });
  const changed = unit !== block.unit || JSON.stringify(inputs) !== JSON.stringify(defaults);
  const titleId = `calc-${block.blockId}`;

  const switchUnit = (next: LengthUnit) => {
    setInputs((current) => convertInputs(current, fields, unit, next));
    setUnit(next);
  };
  const reset = () => {
    setInputs(defaults);
    setUnit(block.unit);
  };

  const unknownMethod = catalogLoaded && !method;
  const state: EvaluationState = unknownMethod ? 'error' : view.state;
  const pinned = isHouseMethodId(block.method) && block.methodVersion !== null;
  const versionNote =
    method && block.methodVersion !== null && block.methodVersion !== method.version
      ? pinned
        ? `pinned to v${block.methodVersion}; v${method.version} is the latest release`
        : `written for v${block.methodVersion}; the server runs v${method.version}`
      : null;

  return (
    <Paper component="section" className={classes.card} aria-labelledby={titleId} data-calculator-block={block.blockId} data-method={block.method} data-state={state}>
      <header className={classes.header}>
        <div className={classes.heading}>
          <Text className={classes.eyebrow}>
            <IconRuler2 size={14} aria-hidden /> Calculator
          </Text>
          <h3 id={titleId} className={classes.caption}>
            {block.caption || method?.title || block.method}
          </h3>
          <Group gap={6} mt={4} wrap="wrap">
            <Text size="sm" c="dimmed">
              {method?.title ?? 'Method'}
            </Text>
            <Badge variant="outline" color="gray" radius="xs" className={classes.methodBadge}>
              {block.method} v{view.result?.version ?? method?.version ?? block.methodVersion ?? '?'}
            </Badge>
            {versionNote && (
              <Text size="xs" c="amber.8">
                {versionNote}
              </Text>
            )}
          </Group>
        </div>
        <Group gap="sm" wrap="nowrap" className={classes.controls}>
          <StatusLabel state={state} />
          {/* In-house methods state their own units; the switch is only for methods that take lengths. */}
          {hasLengthInput(fields) && <UnitToggle value={unit} onChange={switchUnit} />}
        </Group>
      </header>

      {block.acceptance && (
        <div className={classes.rule}>
          <span className={classes.ruleLabel}>The standard requires</span>
          <span className={classes.ruleText}>{acceptanceInWords(block.acceptance, method, block.unit, unit)}</span>
        </div>
      )}

      {unknownMethod ? (
        <Alert color="redline" variant="light" icon={<IconAlertTriangle size={18} />} title="This calculator cannot run">
          The server has no method named <code>{block.method}</code>. Tell the page&rsquo;s owner.
        </Alert>
      ) : (
        <>
          <div className={classes.inputs}>
            <Group justify="space-between" mb="xs">
              <Text className={classes.sectionTitle}>Inputs</Text>
              <Button variant="subtle" size="compact-sm" leftSection={<IconRestore size={14} />} onClick={reset} disabled={!changed}>
                Reset to the standard&rsquo;s values
              </Button>
            </Group>
            {method ? (
              <MethodInputsForm
                schema={method.inputSchema}
                method={method.id}
                value={inputs}
                onChange={setInputs}
                unit={unit}
                locked={block.locked}
                errors={view.state === 'error' ? view.error?.fields : undefined}
              />
            ) : (
              <Text size="sm" c="dimmed">
                Loading the method…
              </Text>
            )}
          </div>

          <div className={classes.results} data-stale={view.stale || undefined}>
            <Group justify="space-between" mb="xs">
              <Text className={classes.sectionTitle}>Result</Text>
              <Group gap="xs">
                {view.stale && view.result && (
                  <Badge color={state === 'error' ? 'redline' : 'gray'} variant="light" radius="xs" data-testid="stale-label">
                    {state === 'error' ? 'Out of date: last result for earlier inputs' : 'Updating…'}
                  </Badge>
                )}
                {resultActions?.({ inputs, unit, evaluated: state === 'current' && !!view.result })}
              </Group>
            </Group>
            {state === 'error' && view.error && (
              <Alert color="redline" variant="light" icon={<IconAlertTriangle size={18} />} mb="sm" title="The server could not evaluate these inputs" role="alert">
                {view.error.message}
                {view.error.statusCode === 0 && (
                  <Button display="block" mt="xs" size="xs" variant="default" onClick={view.retry}>
                    Try again
                  </Button>
                )}
              </Alert>
            )}
            {view.result ? (
              <ResultPanel result={view.result} method={method} acceptance={request.acceptance} stale={view.stale} />
            ) : state !== 'error' ? (
              <div className={classes.placeholder}>
                <Loader size="sm" color="ink.6" /> <Text size="sm">Evaluating on the server…</Text>
              </div>
            ) : null}
          </div>

          {view.result && view.result.steps.length > 0 && (
            <div className={classes.derivation}>
              <Button
                variant="subtle"
                size="compact-sm"
                onClick={() => setShowSteps((open) => !open)}
                aria-expanded={showSteps}
                rightSection={<IconChevronDown size={14} className={showSteps ? classes.chevronOpen : undefined} />}
              >
                {showSteps ? 'Hide derivation' : `Show derivation (${view.result.steps.length} ${view.result.steps.length === 1 ? 'step' : 'steps'})`}
              </Button>
              <Collapse expanded={showSteps}>
                {showSteps && (
                  <div className={classes.steps} data-stale={view.stale || undefined}>
                    <DerivationSteps steps={view.result.steps} references={method?.references} />
                  </div>
                )}
              </Collapse>
            </div>
          )}
        </>
      )}
    </Paper>
  );
}
