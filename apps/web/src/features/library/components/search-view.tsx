import { Anchor, Badge, Button, Group, Pagination, Paper, Select, Skeleton, Stack, Text, Title } from '@mantine/core';
import type { SearchHit } from '@limitbook/contracts';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { useCollections } from '../api/get-collections';
import { useTags } from '../api/get-tags';
import { useSearchPages } from '../api/search-pages';
import { HighlightedText } from './highlighted-text';
import { SearchBox } from './search-box';
import classes from './library.module.css';

const pageSize = 20;

function Result({ hit }: { hit: SearchHit }) {
  return (
    <li className={classes.hit}>
      <Group gap="xs" wrap="wrap" align="baseline">
        <Text className={classes.docNumber}>{hit.numberMatch ? <mark className={classes.mark}>{hit.documentNumber}</mark> : hit.documentNumber}</Text>
        <Anchor component={Link} to={paths.standards.page.getHref(hit.documentNumber)} className={classes.hitTitle}>
          <HighlightedText text={hit.title} ranges={hit.titleHighlights} />
        </Anchor>
      </Group>
      {hit.snippet && (
        <Text size="sm" className={classes.snippet}>
          <HighlightedText text={hit.snippet} ranges={hit.highlights} />
        </Text>
      )}
      <Group gap={6} wrap="wrap" mt={4}>
        <Text size="xs" c="dimmed">
          {hit.collection.name} · Released {formatDate(hit.publishedAt)}
        </Text>
        {hit.tags.slice(0, 5).map((tag) => (
          <Badge key={tag} variant="light" color="gray" radius="xs" size="sm" className={classes.tag}>
            {tag}
          </Badge>
        ))}
      </Group>
    </li>
  );
}

/** Full-text search over released standards, with collection and tag filters kept in the address. */
export function SearchView() {
  const navigate = useNavigate();
  const [params, setParams] = useSearchParams();
  const q = params.get('q')?.trim() ?? '';
  const collection = params.get('collection') ?? undefined;
  const tag = params.get('tag') ?? undefined;
  const page = Math.max(1, Number(params.get('page') ?? 1) || 1);
  const collections = useCollections();
  const tags = useTags();
  const search = useSearchPages({ q, collection, tag, limit: pageSize, offset: (page - 1) * pageSize });

  const update = (changes: Record<string, string | undefined>) => {
    const next = new URLSearchParams(params);
    for (const [key, value] of Object.entries(changes)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    if (!('page' in changes)) next.delete('page');
    setParams(next);
  };
  const filtered = !!collection || !!tag;

  return (
    <Stack gap="lg">
      <header>
        <Text className={classes.eyebrow}>Search</Text>
        <Title order={1} className={classes.title}>
          {q ? <>Results for &ldquo;{q}&rdquo;</> : 'Search the library'}
        </Title>
      </header>
      <SearchBox initial={q} onSearch={(text) => navigate(paths.search.getHref({ q: text || undefined, collection, tag }))} autoFocus={!q} />
      <Group gap="sm" align="flex-end" wrap="wrap">
        <Select
          label="Collection"
          placeholder="All collections"
          clearable
          w={240}
          data={(collections.data?.items ?? []).map((item) => ({ value: item.key, label: item.name }))}
          value={collection ?? null}
          onChange={(value) => update({ collection: value ?? undefined })}
        />
        <Select
          label="Tag"
          placeholder="Any tag"
          clearable
          searchable
          w={220}
          data={(tags.data?.items ?? []).map((item) => ({ value: item.tag, label: `${item.tag} (${item.count})` }))}
          value={tag ?? null}
          onChange={(value) => update({ tag: value ?? undefined })}
        />
        {filtered && (
          <Button variant="subtle" onClick={() => update({ collection: undefined, tag: undefined })}>
            Clear filters
          </Button>
        )}
      </Group>

      {!q ? (
        <Paper className={classes.empty} p="xl">
          <Stack align="center" gap="xs" ta="center" maw={520} mx="auto">
            <Title order={2} className={classes.emptyTitle}>
              What are you looking for?
            </Title>
            <Text c="dimmed">
              Search titles, document numbers, page text and calculator captions. Use &ldquo;quoted phrases&rdquo;, exclude a word with a minus sign, or type the start of a
              document number such as BW-STD-1.
            </Text>
          </Stack>
        </Paper>
      ) : search.isPending ? (
        <Skeleton h={300} />
      ) : search.isError ? (
        <PanelError error={search.error} onRetry={() => void search.refetch()} title="Search failed" />
      ) : search.data.items.length === 0 ? (
        <Paper className={classes.empty} p="xl">
          <Stack align="center" gap="xs" ta="center" maw={520} mx="auto">
            <Title order={2} className={classes.emptyTitle}>
              No released standard matches &ldquo;{q}&rdquo;
            </Title>
            <Text c="dimmed">
              {filtered ? 'Try again without the collection or tag filter, or with fewer words.' : 'Check the spelling, try fewer or more general words, or browse the collections.'}
            </Text>
            <Group gap="sm" mt="xs">
              {filtered && (
                <Button variant="default" onClick={() => update({ collection: undefined, tag: undefined })}>
                  Search everywhere
                </Button>
              )}
              <Button variant="subtle" component={Link} to={paths.library.home.getHref()}>
                Browse the library
              </Button>
            </Group>
          </Stack>
        </Paper>
      ) : (
        <>
          <Text size="sm" c="dimmed" aria-live="polite">
            {search.data.total} {search.data.total === 1 ? 'standard' : 'standards'}, best matches first
          </Text>
          <ol className={classes.hits} aria-label="Search results" data-stale={search.isPlaceholderData || undefined}>
            {search.data.items.map((hit) => (
              <Result key={hit.pageId} hit={hit} />
            ))}
          </ol>
          {search.data.total > pageSize && (
            <Pagination total={Math.ceil(search.data.total / pageSize)} value={page} onChange={(next) => update({ page: String(next) })} />
          )}
        </>
      )}
    </Stack>
  );
}
