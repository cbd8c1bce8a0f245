import { ActionIcon, Button, Grid, Group, Stack, Text, TextInput, Tooltip } from '@mantine/core';
import { designLimits } from '@limitbook/contracts';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { Tex } from '@/components/math/tex';
import { newFormula, renameInTests } from '../lib/definition';
import { errorAt, type DesignerSection } from './designer-context';
import { NumberTextInput } from './number-text-input';
import classes from './designer.module.css';

type Props = DesignerSection & { list: 'intermediates' | 'outputs' };

/** The formula of one field as the server typeset it; nothing while it does not parse (the message says why). */
export function FormulaTex({ tex, path, name }: { tex: Record<string, string>; path: string; name?: string }) {
  const latex = tex[path];
  if (!latex) return null;
  return (
    <div className={classes.tex} data-tex-for={path}>
      <Tex latex={name ? `${texName(name)} = ${latex}` : latex} />
    </div>
  );
}

/** A formula name as TeX: `d_cord` reads as d with the subscript "cord", like the server writes it. */
export function texName(name: string): string {
  const [head = name, ...rest] = name.split('_');
  const escaped = (text: string) => text.replace(/[^A-Za-z0-9]/g, '');
  return rest.length > 0 ? `\\mathit{${escaped(head)}}_{\\mathrm{${escaped(rest.join(' '))}}}` : `\\mathit{${escaped(head)}}`;
}

/** Intermediate values or outputs: `name = expression` in mathjs syntax, shown in a unit with some decimals. */
export function FormulasEditor({ list, ...section }: Props) {
  const { form, readOnly, tex } = section;
  const formulas = form.values[list];
  const noun = list === 'outputs' ? 'output' : 'intermediate value';
  const limit = list === 'outputs' ? designLimits.maxOutputs : designLimits.maxIntermediates;

  const rename = (index: number, next: string) => {
    const previous = formulas[index]?.name ?? '';
    form.setFieldValue(`${list}.${index}.name`, next);
    if (list === 'outputs') form.setFieldValue('tests', renameInTests(form.values.tests, 'expected', previous, next));
  };

  return (
    <Stack gap="sm">
      {formulas.length === 0 && (
        <Text size="sm" c="dimmed">
          {list === 'outputs' ? 'No outputs yet. An output is what readers get back: a named formula shown in its unit.' : 'None. Intermediate values break long formulas into named steps the derivation shows.'}
        </Text>
      )}
      {formulas.map((formula, index) => {
        const base = `${list}.${index}`;
        return (
          <div key={index} className={classes.row} data-formula-row={base}>
            <Grid gap="sm" align="flex-start">
              <Grid.Col span={{ base: 12, sm: 3 }}>
                <TextInput
                  label="Name"
                  className={classes.code}
                  value={formula.name}
                  onChange={(event) => rename(index, event.currentTarget.value)}
                  error={errorAt(section, `${base}.name`)}
                  readOnly={readOnly}
                  spellCheck={false}
                  data-path={`${base}.name`}
                />
              </Grid.Col>
              <Grid.Col span={{ base: 12, sm: 4 }}>
                <TextInput label="Label" {...form.getInputProps(`${base}.label`)} error={errorAt(section, `${base}.label`)} readOnly={readOnly} data-path={`${base}.label`} />
              </Grid.Col>
              <Grid.Col span={{ base: 6, sm: 2 }}>
                <TextInput label="Unit" className={classes.code} {...form.getInputProps(`${base}.unit`)} error={errorAt(section, `${base}.unit`)} readOnly={readOnly} spellCheck={false} data-path={`${base}.unit`} />
              </Grid.Col>
              <Grid.Col span={{ base: 4, sm: 2 }}>
                <NumberTextInput
                  label="Decimals"
                  value={formula.decimals}
                  onChange={(value) => form.setFieldValue(`${base}.decimals`, value ?? 0)}
                  error={errorAt(section, `${base}.decimals`)}
                  readOnly={readOnly}
                  data-path={`${base}.decimals`}
                />
              </Grid.Col>
              <Grid.Col span={{ base: 2, sm: 1 }}>
                {!readOnly && (
                  <Group justify="flex-end" mt={26}>
                    <Tooltip label={`Remove this ${noun}`}>
                      <ActionIcon variant="subtle" color="redline" aria-label={`Remove ${noun} ${index + 1}`} onClick={() => form.removeListItem(list, index)}>
                        <IconTrash size={16} />
                      </ActionIcon>
                    </Tooltip>
                  </Group>
                )}
              </Grid.Col>
              <Grid.Col span={12}>
                <TextInput
                  label={`Expression for ${formula.name || noun}`}
                  className={classes.code}
                  placeholder="e.g. (d_cord - groove_depth) / d_cord * 100"
                  {...form.getInputProps(`${base}.expression`)}
                  error={errorAt(section, `${base}.expression`)}
                  readOnly={readOnly}
                  spellCheck={false}
                  data-path={`${base}.expression`}
                />
                <FormulaTex tex={tex} path={`${base}.expression`} name={formula.name} />
              </Grid.Col>
            </Grid>
          </div>
        );
      })}
      {!readOnly && (
        <Button variant="light" size="compact-sm" w="fit-content" leftSection={<IconPlus size={14} />} onClick={() => form.insertListItem(list, newFormula(list === 'outputs' ? 'y' : 'k', formulas.length))} disabled={formulas.length >= limit}>
          Add {noun}
        </Button>
      )}
      {errorAt(section, list) && (
        <Text size="sm" c="redline.7" role="alert">
          {errorAt(section, list)}
        </Text>
      )}
    </Stack>
  );
}
