import { Button, TextInput } from '@mantine/core';
import { IconSearch } from '@tabler/icons-react';
import { useState, type FormEvent } from 'react';
import classes from './library.module.css';

/** The library's search field; submits the trimmed text. */
export function SearchBox({ initial = '', onSearch, size = 'md', autoFocus = false }: { initial?: string; onSearch: (q: string) => void; size?: 'sm' | 'md'; autoFocus?: boolean }) {
  const [draft, setDraft] = useState(initial);
  const [seen, setSeen] = useState(initial);
  if (seen !== initial) {
    setSeen(initial);
    setDraft(initial);
  }
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSearch(draft.trim());
  };
  return (
    <form role="search" onSubmit={submit} className={classes.search}>
      <TextInput
        aria-label="Search standards"
        placeholder="Document number, title or topic, e.g. BW-STD-112 or wall LMC"
        leftSection={<IconSearch size={18} aria-hidden />}
        size={size}
        value={draft}
        onChange={(event) => setDraft(event.currentTarget.value)}
        className={classes.searchInput}
        type="search"
        autoFocus={autoFocus}
      />
      <Button type="submit" size={size}>
        Search
      </Button>
    </form>
  );
}
