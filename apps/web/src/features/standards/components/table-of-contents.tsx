import { useScrollSpy } from '@mantine/hooks';
import type { OutlineEntry } from '@/components/document/outline';
import classes from './standard-view.module.css';

/** The page's sections, following the reader down the page. */
export function TableOfContents({ entries }: { entries: OutlineEntry[] }) {
  const spy = useScrollSpy({ selector: '[data-standard-body] h2[id^="s-"], [data-standard-body] h3[id^="s-"]', offset: 96 });
  const activeId = spy.data[spy.active]?.id;
  return (
    <nav aria-labelledby="toc-title" className={classes.toc}>
      <p id="toc-title" className={classes.tocTitle}>
        On this page
      </p>
      <ol>
        {entries.map((entry) => (
          <li key={entry.id} data-level={entry.level}>
            <a href={`#${entry.id}`} aria-current={activeId === entry.id ? 'location' : undefined}>
              {entry.text}
            </a>
          </li>
        ))}
      </ol>
    </nav>
  );
}
