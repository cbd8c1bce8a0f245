import { Anchor, Badge, Button, Group, Paper, SimpleGrid, Skeleton, Stack, Text, Title } from '@mantine/core';
import type { Collection } from '@limitbook/contracts';
import { IconArrowRight, IconPlus, IconX } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';
import { useCollections } from '../api/get-collections';
import { usePages } from '../api/get-pages';
import { useTags } from '../api/get-tags';
import { PageList } from './page-list';
import { SearchBox } from './search-box';
import classes from './library.module.css';

function greeting(hour: number) {
  if (hour < 12) return 'Good morning';
  if (hour < 18) return 'Good afternoon';
  return 'Good evening';
}

function CollectionCard({ collection }: { collection: Collection }) {
  return (
    <Paper component={Link} to={paths.library.collection.getHref(collection.key)} className={classes.collectionCard} p="md">
      <Group justify="space-between" align="flex-start" wrap="nowrap" gap="sm">
        <Title order={3} className={classes.collectionName}>
          {collection.name}
        </Title>
        <Badge variant="light" color="ink" radius="xs" className={classes.count}>
          {collection.pageCount} {collection.pageCount === 1 ? 'standard' : 'standards'}
        </Badge>
      </Group>
      <Text size="sm" c="gray.7" mt={6} lineClamp={3}>
        {collection.description}
      </Text>
      <Text size="sm" fw={600} c="ink.7" mt="sm" className={classes.open}>
        Open collection <IconArrowRight size={14} aria-hidden />
      </Text>
    </Paper>
  );
}

function Collections() {
  const collections = useCollections();
  if (collections.isPending) {
    return (
      <SimpleGrid cols={{ base: 1, sm: 2, lg: 4 }}>
        {[0, 1, 2, 3].map((index) => (
          <Skeleton key={index} h={150} />
        ))}
      </SimpleGrid>
    );
  }
  if (collections.isError) return <PanelError error={collections.error} onRetry={() => void collections.refetch()} title="Collections could not be loaded" />;
  if (collections.data.items.length === 0) {
    return <Text c="dimmed">No collections yet. Authors create them when they write the first standard.</Text>;
  }
  return (
    <SimpleGrid cols={{ base: 1, sm: 2, lg: 4 }} spacing="md">
      {collections.data.items.map((collection) => (
        <CollectionCard key={collection.id} collection={collection} />
      ))}
    </SimpleGrid>
  );
}

function PagesPanel({ tag }: { tag: string | null }) {
  const pages = usePages(tag ? { tag, sort: 'number', limit: 100 } : { sort: 'recent', limit: 8 });
  if (pages.isPending) return <Skeleton h={240} />;
  if (pages.isError) return <PanelError error={pages.error} onRetry={() => void pages.refetch()} title="Standards could not be loaded" />;
  if (pages.data.items.length === 0) {
    return <Text c="dimmed">{tag ? `No released standard is tagged “${tag}”.` : 'No standard has been released yet.'}</Text>;
  }
  return <PageList pages={pages.data.items} showCollection label={tag ? `Standards tagged ${tag}` : 'Recently changed standards'} />;
}

function TagCloud({ active }: { active: string | null }) {
  const tags = useTags();
  if (!tags.data || tags.data.items.length === 0) return null;
  return (
    <section aria-labelledby="tags-title" className={classes.block}>
      <Title order={2} id="tags-title" className={classes.blockTitle}>
        Browse by tag
      </Title>
      <Group gap={6} wrap="wrap">
        {tags.data.items.map((item) => (
          <Badge
            key={item.tag}
            component={Link}
            to={active === item.tag ? paths.library.home.getHref() : paths.library.tagged.getHref(item.tag)}
            variant={active === item.tag ? 'filled' : 'outline'}
            color={active === item.tag ? 'ink' : 'gray'}
            radius="xs"
            size="lg"
            className={classes.tagChip}
            aria-current={active === item.tag ? 'true' : undefined}
          >
            {item.tag} <span className={classes.tagCount}>{item.count}</span>
          </Badge>
        ))}
      </Group>
    </section>
  );
}

/** The library's front page: search, the collections, what changed lately, the pages you watch, and tags to browse by. */
export function LibraryHome({ firstName, watched }: { firstName: string; watched?: ReactNode }) {
  const author = canAccess(useSessionUser().role, 'standards.edit');
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const tag = params.get('tag');
  const legacyQuery = params.get('q') ?? '';

  return (
    <Stack gap="xl">
      <section className={classes.hero} aria-labelledby="library-title">
        <Group justify="space-between" align="center">
          <Text className={classes.eyebrow}>Library</Text>
          {author && (
            <Button component={Link} to={paths.standards.create.getHref()} size="xs" leftSection={<IconPlus size={16} />}>
              New standard
            </Button>
          )}
        </Group>
        <Title order={1} id="library-title" className={classes.title}>
          {greeting(new Date().getHours())}, {firstName}
        </Title>
        <Text className={classes.lead}>Find your team&rsquo;s tolerancing standards and run their calculators.</Text>
        <SearchBox initial={legacyQuery} onSearch={(q) => q && navigate(paths.search.getHref({ q }))} />
      </section>

      <section aria-labelledby="collections-title" className={classes.block}>
        <Title order={2} id="collections-title" className={classes.blockTitle}>
          Collections
        </Title>
        <Collections />
      </section>

      {watched && !tag && (
        <section aria-labelledby="watched-title" className={classes.block}>
          <Title order={2} id="watched-title" className={classes.blockTitle}>
            My watched pages
          </Title>
          {watched}
        </section>
      )}

      <section aria-labelledby="pages-title" className={classes.block}>
        <Group justify="space-between" align="baseline">
          <Title order={2} id="pages-title" className={classes.blockTitle}>
            {tag ? (
              <>
                Tagged <span className={classes.tagName}>{tag}</span>
              </>
            ) : (
              'Recently changed'
            )}
          </Title>
          {tag && (
            <Button component={Link} to={paths.library.home.getHref()} variant="subtle" size="compact-sm" leftSection={<IconX size={14} />}>
              Clear tag
            </Button>
          )}
        </Group>
        <PagesPanel tag={tag} />
      </section>

      <TagCloud active={tag} />
      {!tag && (
        <Text size="sm" c="dimmed">
          Looking for something specific? <Anchor component={Link} to={paths.search.getHref()}>Search the full text</Anchor> of every released standard.
        </Text>
      )}
    </Stack>
  );
}
