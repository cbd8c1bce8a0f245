import { Badge, Stack, Table, Text } from '@mantine/core';
import type { DesignDefinition } from '@limitbook/contracts';
import { formatNumber } from '@/components/calculator';
import { Tex } from '@/components/math/tex';
import { texName } from './formulas-editor';
import classes from './designer.module.css';

function range(min: number | null, max: number | null): string {
  if (min === null && max === null) return '—';
  if (min !== null && max !== null) return `${formatNumber(min)} … ${formatNumber(max)}`;
  return min !== null ? `≥ ${formatNumber(min)}` : `≤ ${formatNumber(max as number)}`;
}

function Formulas({ definition, tex, list }: { definition: DesignDefinition; tex: Record<string, string>; list: 'intermediates' | 'outputs' }) {
  const formulas = definition[list];
  if (formulas.length === 0) return null;
  return (
    <div>
      <Text className={classes.sectionTitle} mb={4}>
        {list === 'outputs' ? 'Outputs' : 'Intermediate values'}
      </Text>
      <Table.ScrollContainer minWidth={560}>
        <Table verticalSpacing={6} aria-label={list === 'outputs' ? 'Outputs' : 'Intermediate values'}>
          <Table.Thead>
            <Table.Tr>
              <Table.Th w={200}>Value</Table.Th>
              <Table.Th>Formula</Table.Th>
              <Table.Th w={170}>Shown in</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {formulas.map((formula, index) => {
              const latex = tex[`${list}.${index}.expression`];
              return (
                <Table.Tr key={formula.name}>
                  <Table.Td>
                    <Text size="sm" fw={600}>
                      {formula.label}
                    </Text>
                    <Text className={classes.mono} c="dimmed">
                      {formula.name}
                    </Text>
                  </Table.Td>
                  <Table.Td data-formula={formula.name}>{latex ? <Tex latex={`${texName(formula.name)} = ${latex}`} /> : <code>{formula.expression}</code>}</Table.Td>
                  <Table.Td>
                    <Text size="sm">
                      {formula.unit || 'plain number'}, {formula.decimals} dp
                    </Text>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
    </div>
  );
}

/** A revision's definition as readers and reviewers read it: inputs, formulas typeset from the server's TeX, checks. */
export function DefinitionView({ definition, tex }: { definition: DesignDefinition; tex: Record<string, string> }) {
  return (
    <Stack gap="lg">
      <div>
        <Text className={classes.sectionTitle} mb={4}>
          Inputs
        </Text>
        <Table.ScrollContainer minWidth={560}>
          <Table verticalSpacing={6} aria-label="Inputs">
            <Table.Thead>
              <Table.Tr>
                <Table.Th w={200}>Input</Table.Th>
                <Table.Th w={110}>Quantity</Table.Th>
                <Table.Th w={80}>Unit</Table.Th>
                <Table.Th w={90}>Default</Table.Th>
                <Table.Th w={120}>Range</Table.Th>
                <Table.Th>Help</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {definition.inputs.map((input) => (
                <Table.Tr key={input.name}>
                  <Table.Td>
                    <Text size="sm" fw={600}>
                      {input.label}
                    </Text>
                    <Text className={classes.mono} c="dimmed">
                      {input.name}
                    </Text>
                  </Table.Td>
                  <Table.Td>
                    <Text size="sm">{input.kind}</Text>
                  </Table.Td>
                  <Table.Td>
                    <Text className={classes.mono}>{input.unit || '—'}</Text>
                  </Table.Td>
                  <Table.Td className={classes.numeric}>{input.default === null ? '—' : formatNumber(input.default)}</Table.Td>
                  <Table.Td className={classes.numeric}>{range(input.min, input.max)}</Table.Td>
                  <Table.Td>
                    <Text size="sm">{input.help || '—'}</Text>
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      </div>
      <Formulas definition={definition} tex={tex} list="intermediates" />
      <Formulas definition={definition} tex={tex} list="outputs" />
      {definition.checks.length > 0 && (
        <div>
          <Text className={classes.sectionTitle} mb={4}>
            Checks
          </Text>
          <Table verticalSpacing={6} aria-label="Checks">
            <Table.Tbody>
              {definition.checks.map((check, index) => {
                const latex = tex[`checks.${index}.expression`];
                return (
                  <Table.Tr key={index}>
                    <Table.Td w={280}>{latex ? <Tex latex={latex} /> : <code>{check.expression}</code>}</Table.Td>
                    <Table.Td>
                      <Text size="sm">{check.message}</Text>
                    </Table.Td>
                  </Table.Tr>
                );
              })}
            </Table.Tbody>
          </Table>
        </div>
      )}
      {definition.safetyCritical && (
        <Badge color="redline" variant="light" radius="xs" tt="none">
          Safety-critical: every result carries the safety caution
        </Badge>
      )}
    </Stack>
  );
}
