import type katexModule from 'katex';

type Katex = typeof katexModule;

let loading: Promise<Katex> | null = null;
let loaded: Katex | null = null;

/** KaTeX and its stylesheet, fetched once on the first formula so routes without math stay lean. */
export function loadKatex(): Promise<Katex> {
  loading ??= Promise.all([import('katex'), import('katex/dist/katex.min.css')]).then(([module]) => {
    loaded = module.default;
    return loaded;
  });
  return loading;
}

export function loadedKatex(): Katex | null {
  return loaded;
}
