import { Alert, Anchor, Badge, Breadcrumbs, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import type { LengthUnit, Page } from '@limitbook/contracts';
import { IconArchive } from '@tabler/icons-react';
import { calculatorBlockAttrsSchema } from '@limitbook/editor-schema';
import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { CalculatorBlockView, useMethods, type CalculatorBlockConfig } from '@/components/calculator';
import { DocumentRenderer } from '@/components/document/document-renderer';
import { outlineOf, type DocNode } from '@/components/document/outline';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { canAccess } from '@/lib/authorization';
import { formatDate, formatDateTime } from '@/lib/format';
import { useSessionUser } from '@/lib/session';
import { usePage, type PageView } from '../api/get-page';
import { usePageEvaluations } from '../api/use-page-evaluations';
import { LaggingBlocksNotice } from './lagging-blocks-notice';
import { PageActions } from './page-actions';
import { ReviewPanel, ReviewWaitingBanner } from './review-panel';
import { TableOfContents } from './table-of-contents';
import classes from './standard-view.module.css';

const stateLabels: Record<string, string> = { draft: 'Draft', in_review: 'In review', published: 'Released', released: 'Released', superseded: 'Superseded' };

function blocksOf(node: DocNode, found: CalculatorBlockConfig[] = []): CalculatorBlockConfig[] {
  if (node.type === 'calculatorBlock') {
    const parsed = calculatorBlockAttrsSchema.safeParse(node.attrs ?? {});
    if (parsed.success) found.push(parsed.data);
    return found;
  }
  node.content?.forEach((child) => blocksOf(child, found));
  return found;
}

function NotFound({ documentNumber }: { documentNumber: string }) {
  return (
    <Stack gap="sm" maw={640}>
      <Title order={1}>No standard {documentNumber}</Title>
      <Text>
        There is no released standard with this number, or it is not released yet.{' '}
        <Anchor component={Link} to={paths.search.getHref({ q: documentNumber })}>
          Search for it
        </Anchor>{' '}
        or go back to the <Anchor component={Link} to={paths.library.home.getHref()}>library</Anchor>.
      </Text>
    </Stack>
  );
}

/** What a calculator block's extra actions get: the block, the revision it sits in, and the reader's entries. */
export type CalculatorActionContext = {
  page: Page;
  block: CalculatorBlockConfig;
  inputs: Record<string, unknown>;
  unit: LengthUnit;
  evaluated: boolean;
};

export type StandardViewProps = {
  documentNumber: string;
  view?: PageView;
  /** More header actions (e.g. watching), composed by the route. */
  headerActions?: (page: Page) => ReactNode;
  /** Shown under the header of a release (e.g. its impact check), composed by the route. */
  releaseNotes?: (page: Page) => ReactNode;
  /** Actions beside each calculator block's result (e.g. saving a record), composed by the route. */
  calculatorActions?: (context: CalculatorActionContext) => ReactNode;
};

/** A standard as readers see it: the released text with every calculator block live. */
export function StandardView({ documentNumber, view = 'released', headerActions, releaseNotes, calculatorActions }: StandardViewProps) {
  const page = usePage(documentNumber, view);
  const reviewer = canAccess(useSessionUser().role, 'standards.review');
  const methods = useMethods();
  const document = page.data?.revision.document as DocNode | undefined;
  const blocks = useMemo(() => (document ? blocksOf(document) : []), [document]);
  const outline = useMemo(() => (document ? outlineOf(document).filter((entry) => entry.level <= 2) : []), [document]);
  const evaluations = usePageEvaluations(page.data?.revision.id, blocks, methods.byId, methods.isSuccess);

  if (page.isPending) {
    return (
      <Stack gap="md" maw={760}>
        <Skeleton h={18} w={140} />
        <Skeleton h={36} w="80%" />
        <Skeleton h={16} w="60%" />
        <Skeleton h={400} mt="lg" />
      </Stack>
    );
  }
  if (page.isError) {
    if (isApiError(page.error) && (page.error.status === 404 || page.error.status === 400)) return <NotFound documentNumber={documentNumber} />;
    return <PanelError error={page.error} onRetry={() => void page.refetch()} title="This standard could not be loaded" />;
  }

  const { revision } = page.data;
  // Read as plain strings: document control adds states and letters to what a revision carries.
  const state: string = revision.state;
  const letter = revision.revisionLetter;
  const obsolete = page.data.obsolete;
  const released = state === 'published' || state === 'released';
  const inReview = state === 'in_review';
  const reviewWaiting = reviewer && !inReview && page.data.draft?.state === 'in_review';
  const blocksById = new Map(blocks.map((block) => [block.blockId, block]));

  return (
    <div className={classes.layout}>
      <article className={classes.article} aria-labelledby="standard-title">
        <Breadcrumbs separator="›" className={classes.crumbs}>
          <Anchor component={Link} to={paths.library.home.getHref()} size="sm">
            Library
          </Anchor>
          <Anchor component={Link} to={paths.library.collection.getHref(page.data.collection.key)} size="sm">
            {page.data.collection.name}
          </Anchor>
          <Text size="sm">{page.data.documentNumber}</Text>
        </Breadcrumbs>

        {obsolete && (
          <Alert color="redline" variant="light" title="Obsolete: kept for reference only" icon={<IconArchive size={18} />} mb="md" role="note" data-testid="obsolete-banner">
            <Text size="sm">
              Marked obsolete on {formatDate(obsolete.at)}
              {obsolete.by ? ` by ${obsolete.by.name}` : ''}: {obsolete.reason}
            </Text>
            <Text size="sm" mt={4}>
              Do not apply this standard to new designs. Its text and calculators stay readable for existing work.
            </Text>
          </Alert>
        )}
        {reviewWaiting && <ReviewWaitingBanner documentNumber={page.data.documentNumber} />}
        {reviewer && inReview && <ReviewPanel page={page.data} />}

        <header className={classes.header}>
          <Group justify="space-between" align="center" gap="sm" wrap="wrap">
            <Group gap="sm" align="center" wrap="wrap">
              <Text className={classes.number}>{page.data.documentNumber}</Text>
              {letter && <Text className={classes.letter}>Rev. {letter}</Text>}
              <Badge color={released ? 'verdigris' : state === 'superseded' ? 'gray' : 'amber'} variant={released ? 'light' : 'filled'} radius="xs" className={classes.state}>
                {stateLabels[state] ?? state}
              </Badge>
              {obsolete && (
                <Badge color="redline" variant="filled" radius="xs" className={classes.state}>
                  Obsolete
                </Badge>
              )}
            </Group>
            <PageActions page={page.data} extra={headerActions?.(page.data)} />
          </Group>
          <Title order={1} id="standard-title" className={classes.title}>
            {revision.title}
          </Title>
          <dl className={classes.meta}>
            <div>
              <dt>Collection</dt>
              <dd>
                <Anchor component={Link} to={paths.library.collection.getHref(page.data.collection.key)}>
                  {page.data.collection.name}
                </Anchor>
              </dd>
            </div>
            <div>
              <dt>Owner</dt>
              <dd>{page.data.owner?.name ?? '—'}</dd>
            </div>
            <div>
              <dt>{revision.publishedAt ? 'Released' : 'Last saved'}</dt>
              <dd title={formatDateTime(revision.publishedAt ?? revision.updatedAt)}>{formatDate(revision.publishedAt ?? revision.updatedAt)}</dd>
            </div>
            {revision.publishedBy && (
              <div>
                <dt>Approved by</dt>
                <dd>{revision.publishedBy.name}</dd>
              </div>
            )}
          </dl>
          {page.data.tags.length > 0 && (
            <Group gap={6} wrap="wrap" mt="sm">
              {page.data.tags.map((tag) => (
                <Badge key={tag} component={Link} to={paths.library.tagged.getHref(tag)} variant="outline" color="gray" radius="xs" className={classes.tag}>
                  {tag}
                </Badge>
              ))}
            </Group>
          )}
          {!released && (
            <Text size="sm" c="amber.9" mt="sm">
              This revision is not released: it is not yet a rule.
            </Text>
          )}
        </header>

        <LaggingBlocksNotice page={page.data} />
        {released && releaseNotes?.(page.data)}

        {methods.isError && <PanelError error={methods.error} onRetry={() => void methods.refetch()} title="The calculators could not load their methods" />}

        <div className={classes.body} data-standard-body>
          <DocumentRenderer
            document={revision.document as DocNode}
            fileUrls={page.data.fileUrls}
            renderCalculator={(attrs) => {
              const block = blocksById.get(String(attrs.blockId));
              if (!block) {
                return <PanelError error={new Error('This calculator block is malformed and cannot run.')} title="Calculator unavailable" />;
              }
              return (
                <CalculatorBlockView
                  block={block}
                  method={methods.byId(block.method)}
                  catalogLoaded={methods.isSuccess}
                  evaluationEnabled={evaluations.settled}
                  resultActions={released && calculatorActions ? (current) => calculatorActions({ page: page.data, block, ...current }) : undefined}
                />
              );
            }}
          />
        </div>
      </article>
      {outline.length > 1 && (
        <aside className={classes.aside}>
          <TableOfContents entries={outline} />
        </aside>
      )}
    </div>
  );
}
