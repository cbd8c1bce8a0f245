import { Anchor, Breadcrumbs, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useDocumentTitle } from '@mantine/hooks';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { useMethodCompare } from '@/features/method-designer/api/get-method-compare';
import { useMethodDesign } from '@/features/method-designer/api/get-method-design';
import { useMethodDraft } from '@/features/method-designer/api/get-method-draft';
import { CompareView } from '@/features/method-designer/components/compare-view';
import { DefinitionView } from '@/features/method-designer/components/definition-view';
import { MethodReviewPanel } from '@/features/method-designer/components/method-review-panel';
import { ReviewTestRun } from '@/features/method-designer/components/review-test-run';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';
import classes from './methods-route.module.css';
import { slugOf } from './method-slug';

export function MethodReviewRoute() {
  const methodId = useParams().methodId ?? '';
  const slug = slugOf(methodId) ?? '';
  const navigate = useNavigate();
  const user = useSessionUser();
  const design = useMethodDesign(slug, !!slug);
  const draft = useMethodDraft(slug, !!slug);
  const previous = design.data?.latestVersion ?? null;
  const compare = useMethodCompare(slug, previous !== null ? String(previous) : null, previous !== null ? 'draft' : null);
  useDocumentTitle(`Review · ${draft.data?.definition.name ?? methodId} · Limitbook`);

  if (draft.isPending || design.isPending) return <Skeleton h={480} />;
  if (draft.isError) return <PanelError title="There is no revision of this method to review" error={draft.error} />;
  const revision = draft.data;
  const inReview = revision.state === 'in_review';
  const mayDecide = inReview && canAccess(user.role, 'standards.review');

  return (
    <Stack gap="lg">
      <Breadcrumbs separator="›">
        <Anchor component={Link} to={paths.methods.catalog.getHref()} size="sm">
          Methods
        </Anchor>
        <Text size="sm">{revision.definition.name}</Text>
        <Text size="sm">Review</Text>
      </Breadcrumbs>
      <Stack gap={4}>
        <Text className={classes.eyebrow}>Method review</Text>
        <Title order={1}>{revision.definition.name}</Title>
        <Text className={classes.mono}>
          {methodId} · {previous !== null ? `next version after v${previous}` : 'first version'}
        </Text>
      </Stack>
      {mayDecide ? (
        <MethodReviewPanel
          slug={slug}
          revision={revision}
          onDecided={(kind) => navigate(kind === 'approve' ? paths.methods.method.getHref(methodId) : paths.methods.catalog.getHref())}
        />
      ) : (
        <Text size="sm" c="dimmed">
          {inReview ? 'Only reviewers and admins decide on a method revision.' : 'This revision is not in review.'}
        </Text>
      )}
      {previous !== null && (
        <section className={classes.sheet} aria-labelledby="changes-title">
          <Title order={2} id="changes-title" className={classes.sectionTitle} mb="sm">
            Changes since v{previous}
          </Title>
          {compare.isPending ? <Skeleton h={120} /> : compare.isError ? <PanelError error={compare.error} title="The comparison could not be loaded" /> : <CompareView compare={compare.data} />}
        </section>
      )}
      <section className={classes.sheet} aria-labelledby="definition-title">
        <Title order={2} id="definition-title" className={classes.sectionTitle} mb="sm">
          Definition in review
        </Title>
        {revision.definition.description && (
          <Text size="sm" mb="md">
            {revision.definition.description}
          </Text>
        )}
        <DefinitionView definition={revision.definition} tex={revision.tex} />
      </section>
      <section className={classes.sheet} aria-labelledby="tests-title">
        <Title order={2} id="tests-title" className={classes.sectionTitle} mb="sm">
          Test table
        </Title>
        <ReviewTestRun slug={slug} revision={revision} />
      </section>
    </Stack>
  );
}
