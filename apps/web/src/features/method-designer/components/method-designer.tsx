import { Alert, Anchor, Badge, Breadcrumbs, Button, Group, Stack, Text, Textarea, TextInput, Title, Tooltip } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useHotkeys } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { houseMethodPrefix, type DesignDefinition, type MethodRevision, type TestRun } from '@limitbook/contracts';
import { IconArrowBackUp, IconDeviceFloppy, IconSend } from '@tabler/icons-react';
import { useMutation } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { errorMessage } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { runMethodTests } from '../api/run-method-tests';
import { useLivePreview } from '../hooks/use-live-preview';
import { useMethodDraftSession } from '../hooks/use-method-draft-session';
import { definitionFieldPaths, definitionKey, unplacedProblems } from '../lib/definition';
import { submitBlocker } from '../lib/submit-blocker';
import { ChecksEditor, TextsEditor } from './checks-editor';
import { errorAt, type DesignerSection } from './designer-context';
import { FormulasEditor } from './formulas-editor';
import { InputsEditor } from './inputs-editor';
import { LivePreview } from './live-preview';
import { MethodConflictModal } from './method-conflict-modal';
import { SubmitForReviewModal } from '@/components/review/submit-for-review-modal';
import { TestTableEditor } from './test-table-editor';
import classes from './designer.module.css';

function Block({ title, description, children, id }: { title: string; description?: string; children: ReactNode; id: string }) {
  return (
    <section className={classes.sheet} aria-labelledby={id}>
      <Text component="h2" id={id} className={classes.sectionTitle}>
        {title}
      </Text>
      {description && (
        <Text size="sm" c="dimmed" mt={2} mb="sm">
          {description}
        </Text>
      )}
      {!description && <div style={{ height: 8 }} />}
      {children}
    </section>
  );
}

const stateLabels = { draft: 'Draft', in_review: 'In review', released: 'Released', superseded: 'Superseded' } as const;

/** The in-house method designer: definition, test table and live preview of one open revision. */
export function MethodDesigner({ slug, revision: initial }: { slug: string; revision: MethodRevision }) {
  const methodId = `${houseMethodPrefix}${slug}`;
  const session = useMethodDraftSession(slug, initial);
  const form = useForm<DesignDefinition>({ mode: 'controlled', initialValues: initial.definition });
  const definition = form.values;
  const key = definitionKey(definition);
  const inReview = session.revision.state === 'in_review';
  const readOnly = inReview;
  const preview = useLivePreview(definition);
  const tests = useMutation({ mutationFn: () => runMethodTests(slug) });
  const [testRun, setTestRun] = useState<{ key: string; run: TestRun } | null>(null);
  const [submitOpen, setSubmitOpen] = useState(false);
  const dirty = key !== session.savedKey;

  // The freshest messages win: a refused save until the next preview answers, then the preview's.
  const problems = { ...(preview.outcome ? preview.problems : session.revision.problems), ...(session.refused?.fields ?? {}) };
  const section: DesignerSection = { form, problems, tex: { ...session.revision.tex, ...preview.tex }, readOnly };
  const unplaced = unplacedProblems(problems, definitionFieldPaths(definition));
  const blocker = submitBlocker({ problems, testCount: definition.tests.length, run: testRun?.run ?? null, runOutdated: !!testRun && testRun.key !== key });

  const save = async () => {
    if (readOnly) return;
    if (await session.save(definition)) notifications.show({ color: 'verdigris', title: 'Draft saved', message: `${definition.name} is saved as version ${session.baseVersion + 1}.` });
  };
  useHotkeys([['mod+S', () => void save()]], [], true);

  // The server runs the saved draft's table, so what is on screen is saved first.
  const runTests = async () => {
    const askedKey = key;
    if (dirty && !(await session.save(definition))) return;
    tests.mutate(undefined, {
      onSuccess: (run) => setTestRun({ key: askedKey, run }),
      onError: (error) => notifications.show({ color: 'redline', title: 'Tests not run', message: errorMessage(error) }),
    });
  };

  const submit = async (request: Parameters<typeof session.submit>[1]) => {
    const submitted = await session.submit(definition, request);
    if (submitted) {
      setSubmitOpen(false);
      notifications.show({ color: 'verdigris', title: `${definition.name} is in review`, message: 'The reviewers have been asked by mail.' });
    } else setSubmitOpen(false);
  };

  const reload = async () => {
    const latest = await session.reloadLatest();
    if (latest) form.setValues(latest.definition);
  };

  return (
    <Stack gap="lg">
      <Breadcrumbs separator="›">
        <Anchor component={Link} to={paths.methods.catalog.getHref()} size="sm">
          Methods
        </Anchor>
        {session.revision.methodVersion !== null || initial.restoredFromVersion !== null ? (
          <Anchor component={Link} to={paths.methods.method.getHref(methodId)} size="sm">
            {definition.name || slug}
          </Anchor>
        ) : (
          <Text size="sm">{definition.name || slug}</Text>
        )}
        <Text size="sm">Designer</Text>
      </Breadcrumbs>

      <Group justify="space-between" align="flex-end" wrap="wrap">
        <Stack gap={4}>
          <Text className={classes.sectionTitle} c="redline.7">
            Method designer
          </Text>
          <Title order={1}>{definition.name || 'Untitled method'}</Title>
          <Group gap="xs">
            <Text className={classes.mono}>{methodId}</Text>
            <Badge color={inReview ? 'blue' : 'gray'} variant="light" radius="xs" tt="none">
              {stateLabels[session.revision.state]}
            </Badge>
            <Text size="xs" c="dimmed" role="status">
              {session.phase === 'saving' ? 'Saving…' : dirty ? 'Unsaved changes' : `Saved ${formatDateTime(session.revision.updatedAt)} (version ${session.revision.version})`}
            </Text>
          </Group>
        </Stack>
        <Group gap="sm">
          {inReview ? (
            <Button variant="default" leftSection={<IconArrowBackUp size={16} />} onClick={() => void session.withdraw()} loading={session.phase === 'withdrawing'}>
              Withdraw
            </Button>
          ) : (
            <>
              <Button variant="default" leftSection={<IconDeviceFloppy size={16} />} onClick={() => void save()} loading={session.phase === 'saving'} disabled={!dirty}>
                Save draft
              </Button>
              <Tooltip label={blocker ?? ''} disabled={!blocker} multiline w={260}>
                <span>
                  <Button leftSection={<IconSend size={16} />} onClick={() => setSubmitOpen(true)} disabled={!!blocker} loading={session.phase === 'submitting'}>
                    Submit for review
                  </Button>
                </span>
              </Tooltip>
            </>
          )}
        </Group>
      </Group>

      {inReview && (
        <Alert color="blue" title="In review: read-only" role="note">
          {session.revision.review.reviewers.length > 0 ? `Waiting for ${session.revision.review.reviewers.map((person) => person.name).join(', ')}. ` : ''}
          Withdraw it to make changes.
        </Alert>
      )}
      {!inReview && session.revision.review.comment && (
        <Alert color="amber" title="Sent back by the reviewer" role="note">
          {session.revision.review.comment}
        </Alert>
      )}
      {!inReview && blocker && (
        <Text size="sm" c="dimmed" data-testid="submit-blocker">
          Submit for review: {blocker}
        </Text>
      )}
      {session.refused && (
        <Alert color="redline" title="The server refused this" role="alert" withCloseButton onClose={session.clearRefused}>
          {session.refused.message} The messages are at the fields{Object.keys(session.refused.fields).some((path) => path.startsWith('tests.')) ? ' and the test rows' : ''}.
        </Alert>
      )}
      {unplaced.length > 0 && (
        <Alert color="redline" variant="light" title="Also to fix">
          {unplaced.map((line) => (
            <Text key={line} size="sm">
              {line}
            </Text>
          ))}
        </Alert>
      )}

      <div className={classes.layout}>
        <Stack gap="md">
          <Block title="General" id="general-title">
            <Stack gap="sm">
              <TextInput label="Name" required {...form.getInputProps('name')} error={errorAt(section, 'name')} readOnly={readOnly} data-path="name" />
              <Textarea
                label="Description"
                description="What the method computes and when to use it; readers see it on the method page."
                autosize
                minRows={2}
                {...form.getInputProps('description')}
                error={errorAt(section, 'description')}
                readOnly={readOnly}
                data-path="description"
              />
            </Stack>
          </Block>
          <Block title="Inputs" id="inputs-title" description="Numbers a reader types. Each has a quantity and the unit it is typed in; formulas see it as a quantity with that unit.">
            <InputsEditor {...section} />
          </Block>
          <Block title="Intermediate values" id="intermediates-title" description="Named steps, in order; later formulas may use earlier names.">
            <FormulasEditor list="intermediates" {...section} />
          </Block>
          <Block title="Outputs" id="outputs-title" description="What readers get back, converted into the unit given (same dimension) and rounded to the decimals.">
            <FormulasEditor list="outputs" {...section} />
          </Block>
          <Block title="Checks" id="checks-title" description="Comparisons that must hold; the verdict passes only when all do.">
            <ChecksEditor {...section} />
          </Block>
          <Block title="References and cautions" id="texts-title">
            <TextsEditor {...section} />
          </Block>
        </Stack>
        <div className={classes.sticky}>
          <LivePreview preview={preview} methodId={methodId} definition={definition} />
        </div>
      </div>
      <Block title="Test table" id="tests-title">
        <TestTableEditor {...section} run={testRun?.run ?? null} runOutdated={!!testRun && testRun.key !== key} running={tests.isPending || session.phase === 'saving'} onRun={() => void runTests()} />
      </Block>

      <SubmitForReviewModal
        opened={submitOpen}
        title={`Submit “${definition.name}” for review`}
        intro="The reviewers get a mail. Once approved, the method is released with the next version number and authors can pick it for calculator blocks."
        noteHint="Optional: what the method is for, what to check"
        dirty={dirty}
        submitting={session.phase === 'submitting' || session.phase === 'saving'}
        onClose={() => setSubmitOpen(false)}
        onSubmit={(request) => void submit(request)}
      />
      <MethodConflictModal conflict={session.conflict} onReload={() => void reload()} onKeepMine={() => void session.keepMine()} />
    </Stack>
  );
}
