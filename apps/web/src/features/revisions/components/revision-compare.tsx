import { Alert, Anchor, Badge, Button, Group, Paper, Select, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import type { BlockChange, Page, RevisionCompare as Comparison } from '@limitbook/contracts';
import { IconArrowRight, IconHistory } from '@tabler/icons-react';
import { useMemo, useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { PageHeader } from '@/components/layout/page-header';
import { paths } from '@/config/paths';
import { useRevisionCompare } from '../api/compare-revisions';
import { useRevisions } from '../api/get-revisions';
import { revisionName, stateLabels } from '../lib/revision-name';
import { sideBySide, type Side } from '../lib/side-by-side';
import classes from './revisions.module.css';

const settingLabels: Record<BlockChange['rows'][number]['setting'], string> = {
  method: 'Method and version',
  unit: 'Unit',
  caption: 'Caption',
  acceptance: 'Acceptance rule',
  default: 'Default',
  locked: 'Locked input',
};

const changeLabels: Record<BlockChange['change'], string> = { added: 'Added', removed: 'Removed', changed: 'Changed' };

function Cell({ side }: { side: Side | null }) {
  if (!side) return <td className={classes.diffEmpty} />;
  const mark = side.kind === 'added' ? '+' : side.kind === 'removed' ? '−' : '';
  return (
    <td className={classes.diffCell} data-kind={side.kind}>
      <span className={classes.diffMark} aria-hidden>
        {mark}
      </span>
      {side.spans ? (
        side.spans.map((span, index) =>
          !span.changed ? (
            <span key={index}>{span.text}</span>
          ) : side.kind === 'added' ? (
            <ins key={index} className={classes.word}>
              {span.text}
            </ins>
          ) : (
            <del key={index} className={classes.word}>
              {span.text}
            </del>
          ),
        )
      ) : side.kind === 'added' ? (
        <ins>{side.text || ' '}</ins>
      ) : side.kind === 'removed' ? (
        <del>{side.text || ' '}</del>
      ) : (
        side.text || ' '
      )}
    </td>
  );
}

function TextChanges({ comparison }: { comparison: Comparison }) {
  const rows = useMemo(() => sideBySide(comparison.text), [comparison.text]);
  const [open, setOpen] = useState<Set<number>>(new Set());
  const changed = comparison.text.some((line) => line.kind !== 'unchanged');
  if (!changed) return <Text c="dimmed">The text is the same in both revisions.</Text>;
  return (
    <div className={classes.diffScroll}>
      <table className={classes.diff} aria-label="Text changes">
        <colgroup>
          <col style={{ width: '50%' }} />
          <col style={{ width: '50%' }} />
        </colgroup>
        <thead>
          <tr>
            <th>{revisionName(comparison.from)}</th>
            <th>{revisionName(comparison.to)}</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row, index) =>
            row.kind === 'gap' && !open.has(index) ? (
              <tr key={index} className={classes.diffGap}>
                <td colSpan={2}>
                  <Button variant="subtle" size="compact-xs" onClick={() => setOpen((current) => new Set(current).add(index))}>
                    {row.count} unchanged line{row.count === 1 ? '' : 's'}
                  </Button>
                </td>
              </tr>
            ) : row.kind === 'gap' ? (
              row.lines.map((line, lineIndex) => (
                <tr key={`${index}-${lineIndex}`}>
                  <Cell side={line.left} />
                  <Cell side={line.right} />
                </tr>
              ))
            ) : (
              <tr key={index}>
                <Cell side={row.left} />
                <Cell side={row.right} />
              </tr>
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}

function BlockChanges({ comparison }: { comparison: Comparison }) {
  if (comparison.blocks.length === 0) return <Text c="dimmed">No calculator block changed.</Text>;
  return (
    <Stack gap="md">
      {comparison.blocks.map((block) => (
        <Paper key={block.blockId} p="md" className={classes.card} data-block-change={block.change}>
          <Group gap="sm" mb="xs">
            <Badge color={block.change === 'added' ? 'verdigris' : block.change === 'removed' ? 'redline' : 'amber'} variant="light" radius="xs">
              {changeLabels[block.change]}
            </Badge>
            <Text fw={600}>{block.caption || 'Calculator without a caption'}</Text>
            <Text size="sm" ff="monospace" c="dimmed">
              {block.method}
            </Text>
          </Group>
          {block.rows.length > 0 && (
            <Table verticalSpacing={6} fz="sm" aria-label={`Settings of ${block.caption || block.method}`}>
              <Table.Thead>
                <Table.Tr>
                  <Table.Th w="26%">Setting</Table.Th>
                  <Table.Th>{revisionName(comparison.from)}</Table.Th>
                  <Table.Th w={24} />
                  <Table.Th>{revisionName(comparison.to)}</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {block.rows.map((row, index) => (
                  <Table.Tr key={index}>
                    <Table.Td>
                      {settingLabels[row.setting]}
                      {row.path && (
                        <Text span ff="monospace" size="xs" c="dimmed">
                          {' '}
                          {row.path}
                        </Text>
                      )}
                    </Table.Td>
                    <Table.Td className={classes.before}>{row.from ?? <Text span c="dimmed">none</Text>}</Table.Td>
                    <Table.Td>
                      <IconArrowRight size={14} aria-label="becomes" />
                    </Table.Td>
                    <Table.Td className={classes.after}>{row.to ?? <Text span c="dimmed">none</Text>}</Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          )}
        </Paper>
      ))}
    </Stack>
  );
}

/** Two revisions of a page side by side: title, text lines and calculator-block settings, before → after. */
export function RevisionCompareView({ page, from, to }: { page: Page; from: string | null; to: string | null }) {
  const navigate = useNavigate();
  const history = useRevisions(page.id);
  const comparison = useRevisionCompare(page.id, from, to);
  const options = (history.data?.items ?? []).map((entry) => ({ value: entry.id, label: `${revisionName(entry)} (${stateLabels[entry.state].toLowerCase()})` }));
  const pick = (side: 'from' | 'to', id: string | null) => {
    if (!id) return;
    navigate(paths.standards.compare.getHref(page.documentNumber, side === 'from' ? id : (from ?? undefined), side === 'to' ? id : (to ?? undefined)), { replace: true });
  };

  return (
    <Stack gap="lg" maw={1100}>
      <PageHeader
        eyebrow={page.documentNumber}
        title="Compare revisions"
        description={page.revision.title}
        actions={
          <Button component={Link} to={paths.standards.history.getHref(page.documentNumber)} variant="default" leftSection={<IconHistory size={16} />}>
            History
          </Button>
        }
      />
      <Group gap="sm" align="flex-end" wrap="wrap">
        <Select label="From (older)" data={options} value={from} onChange={(id) => pick('from', id)} w={{ base: '100%', sm: 260 }} allowDeselect={false} />
        <IconArrowRight size={18} className={classes.pickArrow} aria-hidden />
        <Select label="To (newer)" data={options} value={to} onChange={(id) => pick('to', id)} w={{ base: '100%', sm: 260 }} allowDeselect={false} />
      </Group>

      {!from || !to ? (
        <Text c="dimmed">
          Pick two revisions above, or tick two in the <Anchor component={Link} to={paths.standards.history.getHref(page.documentNumber)}>history</Anchor>.
        </Text>
      ) : from === to ? (
        <Text c="dimmed">Pick two different revisions.</Text>
      ) : comparison.isPending ? (
        <Skeleton h={320} />
      ) : comparison.isError ? (
        <PanelError error={comparison.error} onRetry={() => void comparison.refetch()} title="These revisions could not be compared" />
      ) : (
        <>
          {comparison.data.title.changed && (
            <Alert color="amber" variant="light" title="Title changed">
              <Text size="sm">
                <del className={classes.inlineDel}>{comparison.data.title.from}</del> <IconArrowRight size={12} aria-label="becomes" /> <ins className={classes.inlineIns}>{comparison.data.title.to}</ins>
              </Text>
            </Alert>
          )}
          <section aria-labelledby="calc-changes">
            <Title order={2} id="calc-changes" className={classes.sectionTitle}>
              Calculator settings
            </Title>
            <BlockChanges comparison={comparison.data} />
          </section>
          <section aria-labelledby="text-changes">
            <Title order={2} id="text-changes" className={classes.sectionTitle}>
              Text
            </Title>
            <TextChanges comparison={comparison.data} />
          </section>
        </>
      )}
    </Stack>
  );
}
