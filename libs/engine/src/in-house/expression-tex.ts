import { defaultFormulaSetLimits } from '../formula/evaluate-formula-set.js';
import { sandboxedMath } from '../formula/sandboxed-math.js';

/**
 * LaTeX of each expression by field, for the designer's live preview. Parsing builds a tree
 * and runs nothing; expressions too long or too deeply bracketed to parse safely are left out,
 * as are those that do not parse.
 */
export function expressionTex(entries: readonly { field: string; expression: string }[]): Record<string, string> {
  const { parse } = sandboxedMath();
  const tex: Record<string, string> = {};
  for (const { field, expression } of entries) {
    if (expression.length > defaultFormulaSetLimits.maxExpressionLength || bracketDepth(expression) > defaultFormulaSetLimits.maxBracketDepth) continue;
    try {
      tex[field] = parse(expression).toTex().trim();
    } catch {
      // Not parseable: the field's problem says why.
    }
  }
  return tex;
}

function bracketDepth(text: string): number {
  let depth = 0;
  let deepest = 0;
  for (const character of text) {
    if (character === '(' || character === '[' || character === '{') deepest = Math.max(deepest, ++depth);
    else if (character === ')' || character === ']' || character === '}') depth -= 1;
  }
  return deepest;
}
