import type { MarkdownIt, StateBlock, StateInline } from 'markdown-it';

const dollar = 0x24;
const backslash = 0x5c;

function isWhitespace(code: number | undefined): boolean {
  return code === 0x20 || code === 0x09 || code === 0x0a;
}

function isDigit(code: number | undefined): boolean {
  return code !== undefined && code >= 0x30 && code <= 0x39;
}

/**
 * `$…$` inside a line, with the usual guard against prices: the opening `$` is not followed
 * by a space, the closing one not preceded by a space nor followed by a digit.
 */
function inlineMath(state: StateInline, silent: boolean): boolean {
  const { src, pos, posMax } = state;
  if (src.charCodeAt(pos) !== dollar || src.charCodeAt(pos + 1) === dollar) return false;
  if (isWhitespace(src.charCodeAt(pos + 1)) || pos + 1 >= posMax) return false;
  let end = pos + 1;
  for (;;) {
    end = src.indexOf('$', end);
    if (end === -1 || end >= posMax) return false;
    if (src.charCodeAt(end - 1) === backslash) {
      end += 1;
      continue;
    }
    break;
  }
  if (end === pos + 1 || isWhitespace(src.charCodeAt(end - 1)) || isDigit(src.charCodeAt(end + 1))) return false;
  if (!silent) {
    const token = state.push('math_inline', 'math', 0);
    token.markup = '$';
    token.content = src.slice(pos + 1, end);
  }
  state.pos = end + 1;
  return true;
}

function lineText(state: StateBlock, line: number): string {
  return state.src.slice(state.bMarks[line]! + state.tShift[line]!, state.eMarks[line]!);
}

/** `$$` on a line of its own, the formula, `$$` again; or `$$ formula $$` on one line. */
function blockMath(state: StateBlock, startLine: number, endLine: number, silent: boolean): boolean {
  if (state.sCount[startLine]! - state.blkIndent >= 4) return false;
  const first = lineText(state, startLine).trimEnd();
  if (!first.startsWith('$$')) return false;
  const rest = first.slice(2);
  let content: string;
  let nextLine: number;
  if (rest.trim() !== '' && rest.endsWith('$$') && rest.length > 2) {
    content = rest.slice(0, -2);
    nextLine = startLine + 1;
  } else if (rest.trim() === '') {
    const lines: string[] = [];
    let line = startLine + 1;
    for (; line < endLine; line++) {
      const text = lineText(state, line);
      if (text.trimEnd() === '$$') break;
      lines.push(text);
    }
    if (line >= endLine) return false;
    content = lines.join('\n');
    nextLine = line + 1;
  } else {
    return false;
  }
  if (silent) return true;
  const token = state.push('math_block', 'math', 0);
  token.block = true;
  token.markup = '$$';
  token.content = content.trim();
  token.map = [startLine, nextLine];
  state.line = nextLine;
  return true;
}

/** Adds `math_inline` and `math_block` tokens holding LaTeX source. */
export function mathPlugin(md: MarkdownIt): void {
  md.inline.ruler.after('escape', 'math_inline', inlineMath);
  md.block.ruler.before('fence', 'math_block', blockMath, { alt: ['paragraph', 'reference', 'blockquote', 'list'] });
}
