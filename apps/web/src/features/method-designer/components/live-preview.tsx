import { Alert, Badge, Group, Loader, Stack, Text } from '@mantine/core';
import type { DesignDefinition, MethodSummary } from '@limitbook/contracts';
import { IconAlertTriangle, IconEye } from '@tabler/icons-react';
import { DerivationSteps, ResultPanel } from '@/components/calculator';
import { errorMessage } from '@/components/form/server-errors';
import type { useLivePreview } from '../hooks/use-live-preview';
import classes from './designer.module.css';

function withStop(text: string): string {
  return /[.!?]$/.test(text.trim()) ? text.trim() : `${text.trim()}.`;
}

/** What readers would see for the definition on screen, so the result panel labels outputs as they will. */
export function previewSummary(methodId: string, definition: DesignDefinition): MethodSummary {
  return {
    id: methodId,
    version: 0,
    title: definition.name,
    description: definition.description,
    references: definition.references,
    cautions: definition.cautions,
    inputSchema: {},
    outputs: definition.outputs.map((output) => ({ name: output.name, label: output.label || output.name, kind: 'number', description: '' })),
  };
}

type Props = { preview: ReturnType<typeof useLivePreview>; methodId: string; definition: DesignDefinition };

/** The server's result for the definition as typed, evaluated with the inputs' defaults. */
export function LivePreview({ preview, methodId, definition }: Props) {
  const { outcome } = preview;
  const problemCount = outcome && !outcome.ok ? Object.keys(outcome.fields).length : 0;
  return (
    <section className={classes.sheet} aria-labelledby="preview-title" data-preview-state={preview.updating ? 'updating' : outcome ? (outcome.ok ? 'ok' : 'refused') : 'idle'}>
      <Group justify="space-between" mb="sm">
        <Group gap={6}>
          <IconEye size={16} aria-hidden />
          <Text component="h2" id="preview-title" className={classes.sectionTitle}>
            Live preview
          </Text>
        </Group>
        {preview.updating ? (
          <Group gap={6} role="status">
            <Loader size={12} color="ink.6" />
            <Text size="xs" c="dimmed">
              Evaluating…
            </Text>
          </Group>
        ) : outcome?.ok ? (
          <Badge color="verdigris" variant="light" radius="xs" role="status">
            Up to date
          </Badge>
        ) : null}
      </Group>
      <Text size="xs" c="dimmed" mb="sm">
        Evaluated on the server with each input&rsquo;s default.
      </Text>
      {preview.waitingFor ? (
        <Text size="sm" c="dimmed">
          Give the method {preview.waitingFor} to see a result.
        </Text>
      ) : preview.failure ? (
        <Alert color="redline" variant="light" icon={<IconAlertTriangle size={18} />} title="No preview">
          {errorMessage(preview.failure)}
        </Alert>
      ) : !outcome ? (
        <Loader size="sm" color="ink.6" />
      ) : outcome.ok ? (
        <Stack gap="md" opacity={preview.updating ? 0.6 : 1}>
          <ResultPanel result={outcome.response.result} method={previewSummary(methodId, definition)} />
          {outcome.response.result.steps.length > 0 && (
            <div className={classes.scrollX}>
              <DerivationSteps steps={outcome.response.result.steps} />
            </div>
          )}
        </Stack>
      ) : (
        <Alert color="amber" variant="light" icon={<IconAlertTriangle size={18} />} title="Not evaluated" role="alert">
          {problemCount > 0 ? `${withStop(outcome.message)} See the ${problemCount === 1 ? 'message' : `${problemCount} messages`} at the fields.` : outcome.message}
        </Alert>
      )}
    </section>
  );
}
