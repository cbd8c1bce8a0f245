import { useEffect, useRef, useState } from 'react';
import { loadedKatex, loadKatex } from './katex-loader';
import classes from './tex.module.css';

type Props = { latex: string; display?: boolean; className?: string };

/**
 * A LaTeX formula typeset by KaTeX into its own element. KaTeX builds the markup from the
 * formula (with `trust: false`, so no links, classes or styles from the source); until it has
 * loaded, or if it cannot parse the formula, the source is shown as text.
 */
export function Tex({ latex, display = false, className }: Props) {
  const ref = useRef<HTMLElement>(null);
  const [ready, setReady] = useState(() => loadedKatex() !== null);
  const [loadFailed, setLoadFailed] = useState(false);

  useEffect(() => {
    if (ready) return;
    let active = true;
    loadKatex().then(
      () => active && setReady(true),
      () => active && setLoadFailed(true),
    );
    return () => {
      active = false;
    };
  }, [ready]);

  useEffect(() => {
    const katex = loadedKatex();
    const element = ref.current;
    if (!ready || !katex || !element) return;
    try {
      katex.render(latex, element, { displayMode: display, throwOnError: true, trust: false, strict: 'ignore', maxSize: 20, maxExpand: 200, output: 'htmlAndMathml' });
      element.dataset.latexState = 'typeset';
      element.classList.remove(classes.source as string);
      element.removeAttribute('title');
    } catch {
      element.textContent = latex;
      element.dataset.latexState = 'source';
      element.classList.add(classes.source as string);
      element.title = 'Shown as written: the formula could not be typeset';
    }
  }, [ready, latex, display]);

  const Tag = display ? 'div' : 'span';
  return (
    <Tag
      ref={ref as never}
      className={[display ? classes.display : classes.inline, ready ? '' : classes.source, className ?? ''].join(' ')}
      data-latex-state={ready ? undefined : loadFailed ? 'source' : 'loading'}
    >
      {ready ? null : latex}
    </Tag>
  );
}
