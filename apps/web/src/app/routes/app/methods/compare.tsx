import { Anchor, Breadcrumbs, Group, Select, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useDocumentTitle } from '@mantine/hooks';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { useMethodCompare } from '@/features/method-designer/api/get-method-compare';
import { useMethodVersions } from '@/features/method-designer/api/get-method-versions';
import { CompareView } from '@/features/method-designer/components/compare-view';
import classes from './methods-route.module.css';
import { slugOf } from './method-slug';

export function MethodCompareRoute() {
  const methodId = useParams().methodId ?? '';
  const slug = slugOf(methodId) ?? '';
  const [params, setParams] = useSearchParams();
  const versions = useMethodVersions(slug);
  const from = params.get('from');
  const to = params.get('to');
  const compare = useMethodCompare(slug, from, to);
  useDocumentTitle(`Compare · ${methodId} · Limitbook`);

  const options = (versions.data?.items ?? []).map((entry) => ({
    value: entry.methodVersion !== null ? String(entry.methodVersion) : 'draft',
    label: entry.methodVersion !== null ? `v${entry.methodVersion} (${entry.state === 'released' ? 'released' : 'superseded'})` : entry.state === 'in_review' ? 'Revision in review' : 'Draft',
  }));
  const choose = (key: 'from' | 'to', value: string | null) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    setParams(next, { replace: true });
  };

  return (
    <Stack gap="lg">
      <Breadcrumbs separator="›">
        <Anchor component={Link} to={paths.methods.catalog.getHref()} size="sm">
          Methods
        </Anchor>
        <Anchor component={Link} to={paths.methods.method.getHref(methodId)} size="sm">
          {methodId}
        </Anchor>
        <Text size="sm">Compare</Text>
      </Breadcrumbs>
      <Stack gap={4}>
        <Text className={classes.eyebrow}>Compare versions</Text>
        <Title order={1}>{versions.data?.items[0]?.name ?? methodId}</Title>
      </Stack>
      <Group gap="md">
        <Select label="From" data={options} value={from} onChange={(value) => choose('from', value)} allowDeselect={false} w={220} comboboxProps={{ withinPortal: true }} />
        <Select label="To" data={options} value={to} onChange={(value) => choose('to', value)} allowDeselect={false} w={220} comboboxProps={{ withinPortal: true }} />
      </Group>
      <section className={classes.sheet}>
        {!from || !to || from === to ? (
          <Text size="sm" c="dimmed">
            Pick two different versions.
          </Text>
        ) : compare.isPending ? (
          <Skeleton h={160} />
        ) : compare.isError ? (
          <PanelError error={compare.error} title="The comparison could not be loaded" />
        ) : (
          <CompareView compare={compare.data} />
        )}
      </section>
    </Stack>
  );
}
