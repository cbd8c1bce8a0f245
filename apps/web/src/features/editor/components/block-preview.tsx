import { Alert, Button, Group, Loader, Text } from '@mantine/core';
import { useState } from 'react';
import type { AcceptanceRule, MethodSummary } from '@limitbook/contracts';
import { ResultPanel } from '@/components/calculator/result-panel';
import type { EvaluationView } from '@/components/calculator/lib/evaluation-state';
import classes from './calculator-block-view.module.css';

type Props = { view: EvaluationView & { retry: () => void }; method: MethodSummary; acceptance: AcceptanceRule | null };

/** What readers will see first: the defaults evaluated by the server. */
export function BlockPreview({ view, method, acceptance }: Props) {
  // The headline and verdict are what an author checks while editing; the tables and chart on request.
  const [full, setFull] = useState(false);
  return (
    <section className={classes.preview} aria-label="Preview with the default inputs">
      <Group justify="space-between" mb={6}>
        <Text className={classes.sectionTitle}>Preview with the defaults</Text>
        {view.state === 'updating' || view.state === 'loading' ? <Loader size={14} aria-label="Evaluating" /> : null}
      </Group>
      {view.state === 'error' && view.error && (
        <Alert color="amber" variant="light" p="xs" mb="xs">
          <Group justify="space-between" wrap="nowrap" gap="xs">
            <Text size="sm">
              {Object.keys(view.error.fields ?? {}).length > 0 ? 'Readers will have to complete or correct the marked inputs.' : view.error.message}
            </Text>
            {view.error.statusCode === 0 || view.error.statusCode >= 500 ? (
              <Button size="compact-xs" variant="default" onClick={view.retry}>
                Try again
              </Button>
            ) : null}
          </Group>
        </Alert>
      )}
      {view.result ? (
        <>
          <div className={classes.previewBody} data-full={full || undefined}>
            <ResultPanel result={view.result} method={method} acceptance={acceptance} stale={view.stale} hideCautions />
          </div>
          <Button variant="subtle" size="compact-sm" mt={4} onClick={() => setFull((open) => !open)} aria-expanded={full}>
            {full ? 'Show less' : 'Show the full result'}
          </Button>
        </>
      ) : view.state === 'loading' ? (
        <Text size="sm" c="dimmed">
          Evaluating on the server…
        </Text>
      ) : null}
    </section>
  );
}
