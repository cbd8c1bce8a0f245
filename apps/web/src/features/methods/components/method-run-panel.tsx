import { Alert, Button, Collapse, Group, Loader, Paper, Text } from '@mantine/core';
import type { LengthUnit, MethodSummary } from '@limitbook/contracts';
import { IconAlertTriangle, IconChevronDown, IconPlayerPlay, IconRestore } from '@tabler/icons-react';
import { useMemo, useState } from 'react';
import { convertInputs, DerivationSteps, describeInputs, MethodInputsForm, ResultPanel, UnitToggle, useBlockEvaluation, hasLengthInput } from '@/components/calculator';
import { defaultsComplete, initialInputs } from '../lib/initial-inputs';
import classes from './methods.module.css';

/** Runs the released method on the server with the reader's own numbers. */
export function MethodRunPanel({ method }: { method: MethodSummary }) {
  const fields = useMemo(() => describeInputs(method.inputSchema, method.id), [method]);
  const defaults = useMemo(() => initialInputs(fields), [fields]);
  const [inputs, setInputs] = useState<Record<string, unknown>>(defaults);
  const [unit, setUnit] = useState<LengthUnit>('mm');
  const [touched, setTouched] = useState(false);
  const [showSteps, setShowSteps] = useState(false);
  const ready = touched || defaultsComplete(fields, defaults);
  const view = useBlockEvaluation({ method: method.id, inputs, unit }, { enabled: ready });
  const lengths = hasLengthInput(fields);

  const change = (next: Record<string, unknown>) => {
    setTouched(true);
    setInputs(next);
  };
  const switchUnit = (next: LengthUnit) => {
    setInputs((current) => convertInputs(current, fields, unit, next));
    setUnit(next);
  };

  return (
    <Paper component="section" className={classes.sheet} aria-labelledby="run-title" data-state={ready ? view.state : 'waiting'}>
      <Group justify="space-between" mb="md">
        <Group gap="xs">
          <IconPlayerPlay size={18} aria-hidden />
          <Text component="h2" id="run-title" fw={700} size="lg">
            Run v{method.version}
          </Text>
        </Group>
        <Group gap="sm">
          <Button variant="subtle" size="compact-sm" leftSection={<IconRestore size={14} />} onClick={() => (setInputs(defaults), setTouched(false))} disabled={!touched}>
            Reset
          </Button>
          {lengths && <UnitToggle value={unit} onChange={switchUnit} />}
        </Group>
      </Group>
      <div className={classes.runGrid}>
        <div>
          <Text className={classes.sectionTitle}>Your inputs</Text>
          <MethodInputsForm schema={method.inputSchema} method={method.id} value={inputs} onChange={change} unit={unit} errors={ready && view.state === 'error' ? view.error?.fields : undefined} />
        </div>
        <div aria-live="polite">
          <Text className={classes.sectionTitle}>Result</Text>
          {!ready ? (
            <Text size="sm" c="dimmed">
              Type your numbers: the server evaluates the method as you go.
            </Text>
          ) : (
            <>
              {view.state === 'error' && view.error && (
                <Alert color="redline" variant="light" icon={<IconAlertTriangle size={18} />} mb="sm" title="The server could not evaluate these inputs" role="alert">
                  {view.error.message}
                </Alert>
              )}
              {view.result ? (
                <ResultPanel result={view.result} method={method} stale={view.stale} />
              ) : view.state !== 'error' ? (
                <Group gap="xs">
                  <Loader size="sm" color="ink.6" />
                  <Text size="sm">Evaluating on the server…</Text>
                </Group>
              ) : null}
              {view.result && view.result.steps.length > 0 && (
                <div>
                  <Button
                    variant="subtle"
                    size="compact-sm"
                    mt="sm"
                    onClick={() => setShowSteps((open) => !open)}
                    aria-expanded={showSteps}
                    rightSection={<IconChevronDown size={14} style={{ transform: showSteps ? 'rotate(180deg)' : undefined }} />}
                  >
                    {showSteps ? 'Hide derivation' : `Show derivation (${view.result.steps.length} ${view.result.steps.length === 1 ? 'step' : 'steps'})`}
                  </Button>
                  <Collapse expanded={showSteps}>
                    {showSteps && (
                      <div className={classes.scrollX}>
                        <DerivationSteps steps={view.result.steps} references={method.references} />
                      </div>
                    )}
                  </Collapse>
                </div>
              )}
            </>
          )}
        </div>
      </div>
    </Paper>
  );
}
