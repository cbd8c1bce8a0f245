import { Tex } from '@/components/math/tex';
import classes from './math.module.css';

type Props = { latex: string; displayMode: boolean; placeholder?: string };

/** A formula typeset by the shared KaTeX renderer, or a hint where there is no source yet. */
export function MathFormula({ latex, displayMode, placeholder = 'Empty formula' }: Props) {
  if (!latex.trim()) return <span className={classes.empty}>{placeholder}</span>;
  return <Tex latex={latex} display={displayMode} />;
}
