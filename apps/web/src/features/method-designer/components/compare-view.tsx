import { Badge, Group, Stack, Table, Text } from '@mantine/core';
import type { DefinitionChange, MethodCompare } from '@limitbook/contracts';
import classes from './designer.module.css';

const sectionLabels: Record<DefinitionChange['section'], string> = {
  general: 'General',
  inputs: 'Inputs',
  intermediates: 'Intermediate values',
  outputs: 'Outputs',
  checks: 'Checks',
  references: 'References',
  cautions: 'Cautions',
  tests: 'Test table',
};

const changeColors = { added: 'verdigris', removed: 'redline', changed: 'amber' } as const;

function versionName(ref: MethodCompare['from']): string {
  return ref.methodVersion !== null ? `v${ref.methodVersion}` : ref.state === 'in_review' ? 'the revision in review' : 'the draft';
}

function WordDiff({ parts }: { parts: NonNullable<DefinitionChange['text']> }) {
  return (
    <Text size="sm" className={classes.mono} component="div" mt={6} data-testid="word-diff" aria-label="Word by word">
      {parts.map((part, index) =>
        part.kind === 'added' ? (
          <ins key={index} className={classes.ins}>
            {part.text}
          </ins>
        ) : part.kind === 'removed' ? (
          <del key={index} className={classes.del}>
            {part.text}
          </del>
        ) : (
          <span key={index}>{part.text}</span>
        ),
      )}
    </Text>
  );
}

/** What changed between two versions of a method, section by section, as tables a reviewer reads. */
export function CompareView({ compare }: { compare: MethodCompare }) {
  if (compare.changes.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        No difference between {versionName(compare.from)} and {versionName(compare.to)}.
      </Text>
    );
  }
  const sections = [...new Set(compare.changes.map((change) => change.section))];
  return (
    <Stack gap="lg">
      <Text size="sm">
        From {versionName(compare.from)} to {versionName(compare.to)}: {compare.changes.length} {compare.changes.length === 1 ? 'change' : 'changes'}.
      </Text>
      {sections.map((section) => (
        <section key={section} aria-label={`Changes to ${sectionLabels[section].toLowerCase()}`}>
          <Text className={classes.sectionTitle} mb={4}>
            {sectionLabels[section]}
          </Text>
          <Stack gap="sm">
            {compare.changes
              .filter((change) => change.section === section)
              .map((change, index) => (
                <div key={`${change.key}-${index}`} className={classes.change} data-change={change.change}>
                  <Group gap="xs" mb={4}>
                    <Badge color={changeColors[change.change]} variant="light" radius="xs" tt="none">
                      {change.change}
                    </Badge>
                    <Text className={classes.mono} fw={600}>
                      {change.key.startsWith('#') ? `${sectionLabels[section].replace(/s$/, '')} ${change.key}` : change.key}
                    </Text>
                  </Group>
                  {change.rows.length > 0 && (
                    <Table withTableBorder verticalSpacing={4} aria-label={`${sectionLabels[section]} ${change.key}`}>
                      <Table.Thead>
                        <Table.Tr>
                          <Table.Th w={160}>Setting</Table.Th>
                          <Table.Th>Before</Table.Th>
                          <Table.Th>After</Table.Th>
                        </Table.Tr>
                      </Table.Thead>
                      <Table.Tbody>
                        {change.rows.map((row) => (
                          <Table.Tr key={row.field}>
                            <Table.Td>
                              <Text size="sm">{row.field}</Text>
                            </Table.Td>
                            <Table.Td className={classes.before}>
                              <Text size="sm" className={classes.mono}>
                                {row.from ?? '—'}
                              </Text>
                            </Table.Td>
                            <Table.Td className={classes.after}>
                              <Text size="sm" className={classes.mono}>
                                {row.to ?? '—'}
                              </Text>
                            </Table.Td>
                          </Table.Tr>
                        ))}
                      </Table.Tbody>
                    </Table>
                  )}
                  {change.text && <WordDiff parts={change.text} />}
                </div>
              ))}
          </Stack>
        </section>
      ))}
    </Stack>
  );
}
