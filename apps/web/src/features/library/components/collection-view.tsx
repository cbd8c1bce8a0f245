import { Anchor, Badge, Breadcrumbs, Group, SegmentedControl, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useMemo } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { useCollections } from '../api/get-collections';
import { usePages } from '../api/get-pages';
import { PageList } from './page-list';
import classes from './library.module.css';

/** One collection: its standards, filtered by tag and ordered by number or by last change. */
export function CollectionView({ collectionKey }: { collectionKey: string }) {
  const [params, setParams] = useSearchParams();
  const tag = params.get('tag') ?? undefined;
  const sort = params.get('sort') === 'recent' ? 'recent' : 'number';
  const collections = useCollections();
  const collection = collections.data?.items.find((item) => item.key === collectionKey);
  // All of the collection's pages (untagged) give the tag filter its choices.
  const all = usePages({ collection: collectionKey, sort: 'number', limit: 200 });
  const pages = usePages({ collection: collectionKey, tag, sort, limit: 200 });

  const tags = useMemo(() => {
    const counts = new Map<string, number>();
    for (const page of all.data?.items ?? []) for (const item of page.tags) counts.set(item, (counts.get(item) ?? 0) + 1);
    return [...counts.entries()].sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]));
  }, [all.data]);

  const setParam = (key: string, value: string | undefined) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    setParams(next, { replace: true });
  };

  if (collections.isSuccess && !collection) {
    return (
      <Stack>
        <Title order={1}>No such collection</Title>
        <Text>
          There is no collection called &ldquo;{collectionKey}&rdquo;. <Anchor component={Link} to={paths.library.home.getHref()}>Back to the library</Anchor>
        </Text>
      </Stack>
    );
  }

  return (
    <Stack gap="lg">
      <Breadcrumbs separator="›" className={classes.crumbs}>
        <Anchor component={Link} to={paths.library.home.getHref()} size="sm">
          Library
        </Anchor>
        <Text size="sm">{collection?.name ?? collectionKey}</Text>
      </Breadcrumbs>
      <header>
        <Text className={classes.eyebrow}>Collection</Text>
        <Title order={1} className={classes.title}>
          {collection?.name ?? <Skeleton h={32} w={280} />}
        </Title>
        {collection?.description && (
          <Text c="gray.7" mt={6} maw={760}>
            {collection.description}
          </Text>
        )}
      </header>

      <Group justify="space-between" align="flex-end" gap="md">
        <div className={classes.filter}>
          <Text size="sm" fw={600} mb={6} id="tag-filter-label">
            Filter by tag
          </Text>
          <Group gap={6} wrap="wrap" role="group" aria-labelledby="tag-filter-label">
            <Badge component="button" type="button" onClick={() => setParam('tag', undefined)} variant={tag ? 'outline' : 'filled'} color={tag ? 'gray' : 'ink'} radius="xs" size="lg" className={classes.tagChip} aria-pressed={!tag}>
              All
            </Badge>
            {tags.map(([item, count]) => (
              <Badge
                key={item}
                component="button"
                type="button"
                onClick={() => setParam('tag', tag === item ? undefined : item)}
                variant={tag === item ? 'filled' : 'outline'}
                color={tag === item ? 'ink' : 'gray'}
                radius="xs"
                size="lg"
                className={classes.tagChip}
                aria-pressed={tag === item}
              >
                {item} <span className={classes.tagCount}>{count}</span>
              </Badge>
            ))}
          </Group>
        </div>
        <SegmentedControl
          size="xs"
          aria-label="Order"
          value={sort}
          onChange={(value) => setParam('sort', value === 'recent' ? 'recent' : undefined)}
          data={[
            { value: 'number', label: 'By number' },
            { value: 'recent', label: 'Recently changed' },
          ]}
        />
      </Group>

      {pages.isPending ? (
        <Skeleton h={260} />
      ) : pages.isError ? (
        <PanelError error={pages.error} onRetry={() => void pages.refetch()} title="Standards could not be loaded" />
      ) : pages.data.items.length === 0 ? (
        <Text c="dimmed">{tag ? `No standard in this collection is tagged “${tag}”.` : 'This collection has no released standards yet.'}</Text>
      ) : (
        <>
          <Text size="sm" c="dimmed" aria-live="polite">
            {pages.data.total} {pages.data.total === 1 ? 'standard' : 'standards'}
            {tag ? ` tagged “${tag}”` : ''}
          </Text>
          <PageList pages={pages.data.items} label={`Standards in ${collection?.name ?? collectionKey}`} />
        </>
      )}
    </Stack>
  );
}
