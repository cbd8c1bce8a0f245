import { ActionIcon, Button, Checkbox, Grid, Group, Stack, Text, Textarea, TextInput, Tooltip } from '@mantine/core';
import { designLimits } from '@limitbook/contracts';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { errorAt, type DesignerSection } from './designer-context';
import { FormulaTex } from './formulas-editor';
import classes from './designer.module.css';

/** Comparisons that must hold; together they make the verdict a reader sees. */
export function ChecksEditor(section: DesignerSection) {
  const { form, readOnly, tex } = section;
  const checks = form.values.checks;
  return (
    <Stack gap="sm">
      {checks.length === 0 && (
        <Text size="sm" c="dimmed">
          No checks: results come without a verdict.
        </Text>
      )}
      {checks.map((_check, index) => (
        <div key={index} className={classes.row} data-check-row={index}>
          <Grid gap="sm" align="flex-start">
            <Grid.Col span={{ base: 12, sm: 5 }}>
              <TextInput
                label={`Check ${index + 1}`}
                className={classes.code}
                placeholder="squeeze >= 10"
                {...form.getInputProps(`checks.${index}.expression`)}
                error={errorAt(section, `checks.${index}.expression`)}
                readOnly={readOnly}
                spellCheck={false}
                data-path={`checks.${index}.expression`}
              />
              <FormulaTex tex={tex} path={`checks.${index}.expression`} />
            </Grid.Col>
            <Grid.Col span={{ base: 10, sm: 6 }}>
              <TextInput
                label="What it asks"
                placeholder="Squeeze is at least 10 %"
                {...form.getInputProps(`checks.${index}.message`)}
                error={errorAt(section, `checks.${index}.message`)}
                readOnly={readOnly}
                data-path={`checks.${index}.message`}
              />
            </Grid.Col>
            <Grid.Col span={{ base: 2, sm: 1 }}>
              {!readOnly && (
                <Group justify="flex-end" mt={26}>
                  <Tooltip label="Remove this check">
                    <ActionIcon variant="subtle" color="redline" aria-label={`Remove check ${index + 1}`} onClick={() => form.removeListItem('checks', index)}>
                      <IconTrash size={16} />
                    </ActionIcon>
                  </Tooltip>
                </Group>
              )}
            </Grid.Col>
          </Grid>
        </div>
      ))}
      {!readOnly && (
        <Button
          variant="light"
          size="compact-sm"
          w="fit-content"
          leftSection={<IconPlus size={14} />}
          onClick={() => form.insertListItem('checks', { expression: '', message: '' })}
          disabled={checks.length >= designLimits.maxChecks}
        >
          Add check
        </Button>
      )}
    </Stack>
  );
}

/** References and cautions: one text per line item; and the flag that adds the safety caution. */
export function TextsEditor(section: DesignerSection) {
  const { form, readOnly } = section;
  const list = (key: 'references' | 'cautions', noun: string, placeholder: string) => (
    <Stack gap={6}>
      <Text size="sm" fw={500}>
        {key === 'references' ? 'References' : 'Cautions'}
      </Text>
      {form.values[key].map((_text, index) => (
        <Group key={index} gap={6} wrap="nowrap" align="flex-start">
          <Textarea
            aria-label={`${noun} ${index + 1}`}
            autosize
            minRows={1}
            style={{ flex: 1 }}
            placeholder={placeholder}
            {...form.getInputProps(`${key}.${index}`)}
            error={errorAt(section, `${key}.${index}`)}
            readOnly={readOnly}
            data-path={`${key}.${index}`}
          />
          {!readOnly && (
            <ActionIcon variant="subtle" color="redline" mt={6} aria-label={`Remove ${noun.toLowerCase()} ${index + 1}`} onClick={() => form.removeListItem(key, index)}>
              <IconTrash size={16} />
            </ActionIcon>
          )}
        </Group>
      ))}
      {!readOnly && (
        <Button variant="subtle" size="compact-sm" w="fit-content" leftSection={<IconPlus size={14} />} onClick={() => form.insertListItem(key, '')} disabled={form.values[key].length >= designLimits.maxTexts}>
          Add {noun.toLowerCase()}
        </Button>
      )}
    </Stack>
  );
  return (
    <Stack gap="md">
      {list('references', 'Reference', 'Standard and clause, or handbook and edition')}
      {list('cautions', 'Caution', 'Scope or safety note shown beside every result')}
      <Checkbox
        label="Safety-critical: add the standard safety caution to every result"
        description="For pressure, strength or safety-critical fits. The result then defers to the applicable codes."
        checked={form.values.safetyCritical}
        onChange={(event) => form.setFieldValue('safetyCritical', event.currentTarget.checked)}
        disabled={readOnly}
      />
    </Stack>
  );
}
