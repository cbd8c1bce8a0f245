import { Button, Paper, Stack, Text, TextInput, Title } from '@mantine/core';
import { IconSearch } from '@tabler/icons-react';
import { useState, type FormEvent } from 'react';
import { useSearchParams } from 'react-router-dom';
import classes from './library-home.module.css';

function greeting(hour: number) {
  if (hour < 12) return 'Good morning';
  if (hour < 18) return 'Good afternoon';
  return 'Good evening';
}

/** Library landing page. The library has no standards yet, and the page says so plainly. */
export function LibraryHome({ firstName }: { firstName: string }) {
  const [params, setParams] = useSearchParams();
  const query = params.get('q') ?? '';
  const [draft, setDraft] = useState(query);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const q = draft.trim();
    setParams(q ? { q } : {});
  };

  return (
    <Stack gap="xl">
      <section className={classes.hero} aria-labelledby="library-title">
        <Text className={classes.eyebrow}>Library</Text>
        <Title order={1} id="library-title" className={classes.title}>
          {greeting(new Date().getHours())}, {firstName}
        </Title>
        <Text className={classes.lead}>Find your team&rsquo;s tolerancing standards and run their calculators.</Text>
        <form role="search" onSubmit={submit} className={classes.search}>
          <TextInput
            aria-label="Search standards"
            placeholder="Search by document number, title or topic"
            leftSection={<IconSearch size={18} aria-hidden />}
            size="md"
            value={draft}
            onChange={(event) => setDraft(event.currentTarget.value)}
            className={classes.searchInput}
          />
          <Button type="submit" size="md">
            Search
          </Button>
        </form>
      </section>

      <Paper className={classes.empty} p="xl">
        <Stack align="center" gap="xs" ta="center" maw={520} mx="auto">
          <svg width="56" height="56" viewBox="0 0 56 56" aria-hidden="true" className={classes.emptyMark}>
            <rect x="10" y="6" width="36" height="44" rx="2" />
            <path d="M17 17h22M17 24h22M17 31h14" />
            <path d="M36 38h6M39 35v6" className={classes.plus} />
          </svg>
          {query ? (
            <>
              <Title order={2} className={classes.emptyTitle}>
                Nothing matches &ldquo;{query}&rdquo;
              </Title>
              <Text c="dimmed">The library has no standards yet, so there is nothing to search.</Text>
            </>
          ) : (
            <>
              <Title order={2} className={classes.emptyTitle}>
                No standards yet
              </Title>
              <Text c="dimmed">
                Released standards will be listed here, grouped by collection, each with its revision and its
                calculators.
              </Text>
            </>
          )}
        </Stack>
      </Paper>
    </Stack>
  );
}
