import type { JSONContent } from '@tiptap/core';
import MarkdownIt, { type Token } from 'markdown-it';
import { parseAcceptanceRule } from '../calculator/acceptance-rule.js';
import { headingLevels } from '../extensions/limitbook-extensions.js';
import { cautionLevels } from '../nodes/caution.js';
import { isSafeHref } from '../urls/safe-url.js';
import { limitbookSchema, type LimitbookDocument } from '../validation/limitbook-schema.js';
import { mathPlugin } from './math-plugin.js';

/** A Markdown construct that has no place in a page, with the 1-based source line where it starts. */
export class MarkdownConversionError extends Error {
  constructor(
    message: string,
    readonly line: number | null,
  ) {
    super(line === null ? message : `line ${line}: ${message}`);
    this.name = 'MarkdownConversionError';
  }
}

export interface MarkdownToDocumentOptions {
  /** Lines before the Markdown in its file (e.g. front matter), so errors name the file's line. */
  lineOffset?: number;
}

type Mark = NonNullable<JSONContent['marks']>[number];

// Raw HTML stays text (html: false) so nothing of it can reach a stored page.
const markdown = new MarkdownIt('default', { html: false, linkify: false, typographer: false }).use(mathPlugin);

const maxHeadingLevel = Math.max(...headingLevels);
const cautionContent = new Set(['paragraph', 'bulletList', 'orderedList']);

// ProseMirror ranks marks in the order the schema declares them, and a text node's marks must follow it.
function markRank(mark: Mark): number {
  const rank = Object.keys(limitbookSchema().marks).indexOf(mark.type);
  return rank === -1 ? Number.MAX_SAFE_INTEGER : rank;
}

function sameMarks(a: Mark[] | undefined, b: Mark[] | undefined): boolean {
  return JSON.stringify(a ?? []) === JSON.stringify(b ?? []);
}

class Converter {
  constructor(
    private readonly tokens: Token[],
    private readonly lineOffset: number,
  ) {}

  lineOf(token: Token | undefined): number | null {
    return token?.map ? token.map[0] + 1 + this.lineOffset : null;
  }

  fail(token: Token | undefined, message: string): never {
    throw new MarkdownConversionError(message, this.lineOf(token));
  }

  /** Converts block tokens from `start` until a token of type `until` (or the end); returns the nodes and the index after it. */
  blocks(start: number, until: string | null): [JSONContent[], number] {
    const nodes: JSONContent[] = [];
    let index = start;
    while (index < this.tokens.length) {
      const token = this.tokens[index]!;
      if (token.type === until) return [nodes, index + 1];
      index = this.block(index, nodes);
    }
    if (until !== null) this.fail(this.tokens[start], `Unclosed ${until.replace(/_close$/, '')}`);
    return [nodes, index];
  }

  private block(index: number, out: JSONContent[]): number {
    const token = this.tokens[index]!;
    switch (token.type) {
      case 'heading_open': {
        const level = Math.min(Number(token.tag.slice(1)), maxHeadingLevel);
        out.push({ type: 'heading', attrs: { level }, content: this.inline(this.tokens[index + 1]) });
        return index + 3;
      }
      case 'paragraph_open':
        out.push(...this.paragraphs(this.tokens[index + 1]));
        return index + 3;
      case 'bullet_list_open':
      case 'ordered_list_open': {
        const [items, next] = this.blocks(index + 1, token.type.replace('_open', '_close'));
        if (token.type === 'bullet_list_open') out.push({ type: 'bulletList', content: items });
        else out.push({ type: 'orderedList', attrs: { start: Number(token.attrGet('start') ?? 1) }, content: items });
        return next;
      }
      case 'list_item_open': {
        const [content, next] = this.blocks(index + 1, 'list_item_close');
        if (content[0]?.type !== 'paragraph') content.unshift({ type: 'paragraph' });
        out.push({ type: 'listItem', content });
        return next;
      }
      case 'blockquote_open': {
        const [content, next] = this.blocks(index + 1, 'blockquote_close');
        out.push({ type: 'blockquote', content: content.length > 0 ? content : [{ type: 'paragraph' }] });
        return next;
      }
      case 'table_open':
        return this.table(index, out);
      case 'hr':
        out.push({ type: 'horizontalRule' });
        return index + 1;
      case 'math_block':
        if (token.content.trim() === '') this.fail(token, 'Empty $$ formula');
        out.push({ type: 'blockMath', attrs: { latex: token.content } });
        return index + 1;
      case 'code_block':
        out.push(codeBlock(token.content, null));
        return index + 1;
      case 'fence':
        out.push(this.fence(token));
        return index + 1;
      default:
        return this.fail(token, `Markdown element ${token.type} is not supported in a page`);
    }
  }

  private fence(token: Token): JSONContent {
    const info = token.info.trim().split(/\s+/)[0] ?? '';
    switch (info) {
      case 'caution':
        return this.caution(token);
      case 'calculator':
        return this.calculator(token);
      case 'math':
        if (token.content.trim() === '') this.fail(token, 'Empty math block');
        return { type: 'blockMath', attrs: { latex: token.content.trim() } };
      default:
        return codeBlock(token.content, info === '' ? null : info);
    }
  }

  private caution(token: Token): JSONContent {
    const lines = token.content.split('\n');
    const first = lines.findIndex((line) => line.trim() !== '');
    let level: string | undefined;
    let bodyStart = 0;
    const levelLine = first === -1 ? null : /^\s*level:\s*(\S+)\s*$/.exec(lines[first]!);
    if (levelLine) {
      level = levelLine[1]!;
      if (!(cautionLevels as readonly string[]).includes(level)) this.fail(token, `Caution level must be one of ${cautionLevels.join(', ')}, not ${level}`);
      bodyStart = first + 1;
    }
    // The fence line itself, then the lines skipped above.
    const offset = (this.lineOf(token) ?? 1) + bodyStart;
    const content = convertBlocks(lines.slice(bodyStart).join('\n'), offset);
    if (content.length === 0) this.fail(token, 'A caution needs some text');
    const misplaced = content.find((node) => !cautionContent.has(node.type ?? ''));
    if (misplaced) this.fail(token, `A caution holds paragraphs and lists only, not ${misplaced.type}`);
    return { type: 'caution', attrs: level ? { level } : {}, content };
  }

  private calculator(token: Token): JSONContent {
    let attrs: unknown;
    try {
      attrs = JSON.parse(token.content) as unknown;
    } catch (error) {
      this.fail(token, `Calculator block is not valid JSON: ${error instanceof Error ? error.message : String(error)}`);
    }
    if (attrs === null || typeof attrs !== 'object' || Array.isArray(attrs)) this.fail(token, 'Calculator block must be a JSON object');
    const record = { ...(attrs as Record<string, unknown>) };
    if (typeof record.acceptance === 'string') {
      const parsed = parseAcceptanceRule(record.acceptance);
      if (!parsed.ok) this.fail(token, `Acceptance rule "${record.acceptance}": ${parsed.message}`);
      record.acceptance = parsed.rule;
    }
    return { type: 'calculatorBlock', attrs: record };
  }

  private table(index: number, out: JSONContent[]): number {
    const rows: JSONContent[] = [];
    let row: JSONContent[] | null = null;
    let cursor = index + 1;
    for (; cursor < this.tokens.length; cursor++) {
      const token = this.tokens[cursor]!;
      if (token.type === 'table_close') break;
      if (token.type === 'tr_open') row = [];
      else if (token.type === 'tr_close') {
        rows.push({ type: 'tableRow', content: row ?? [] });
        row = null;
      } else if (token.type === 'th_open' || token.type === 'td_open') {
        const align = /text-align:\s*(left|center|right)/.exec(String(token.attrGet('style') ?? ''))?.[1];
        const inline = this.inline(this.tokens[cursor + 1]);
        row?.push({
          type: token.type === 'th_open' ? 'tableHeader' : 'tableCell',
          ...(align ? { attrs: { align } } : {}),
          content: [inline.length > 0 ? { type: 'paragraph', content: inline } : { type: 'paragraph' }],
        });
        cursor += 2;
      }
    }
    out.push({ type: 'table', content: rows });
    return cursor + 1;
  }

  /** A paragraph's inline content; block images split it, since images are blocks in a page. */
  private paragraphs(inlineToken: Token | undefined): JSONContent[] {
    const nodes: JSONContent[] = [];
    let run: JSONContent[] = [];
    const flush = () => {
      const trimmed = trimRun(run);
      if (trimmed.length > 0) nodes.push({ type: 'paragraph', content: trimmed });
      run = [];
    };
    for (const node of this.inline(inlineToken, true)) {
      if (node.type === 'image') {
        flush();
        nodes.push(node);
      } else {
        run.push(node);
      }
    }
    flush();
    return nodes;
  }

  inline(token: Token | undefined, allowImages = false): JSONContent[] {
    if (!token || token.type !== 'inline') return [];
    const nodes: JSONContent[] = [];
    const marks: Mark[] = [];
    const pushText = (text: string, extra?: Mark) => {
      if (text === '') return;
      let active = extra ? [...marks, extra] : [...marks];
      // The code mark excludes every other mark; a link keeps its target instead.
      if (active.some((mark) => mark.type === 'code') && active.length > 1) {
        active = active.filter((mark) => mark.type === 'link');
        if (active.length === 0) active = [{ type: 'code' }];
      }
      active.sort((a, b) => markRank(a) - markRank(b));
      const previous = nodes[nodes.length - 1];
      if (previous?.type === 'text' && sameMarks(previous.marks, active)) {
        previous.text += text;
        return;
      }
      nodes.push({ type: 'text', text, ...(active.length > 0 ? { marks: active } : {}) });
    };
    const close = (type: string) => {
      const at = marks.map((mark) => mark.type).lastIndexOf(type);
      if (at !== -1) marks.splice(at, 1);
    };
    for (const child of token.children ?? []) {
      switch (child.type) {
        case 'text':
        case 'text_special':
          pushText(child.content);
          break;
        case 'softbreak':
          pushText(' ');
          break;
        case 'hardbreak':
          nodes.push({ type: 'hardBreak' });
          break;
        case 'code_inline':
          pushText(child.content, { type: 'code' });
          break;
        case 'strong_open':
          marks.push({ type: 'bold' });
          break;
        case 'em_open':
          marks.push({ type: 'italic' });
          break;
        case 's_open':
          marks.push({ type: 'strike' });
          break;
        case 'strong_close':
          close('bold');
          break;
        case 'em_close':
          close('italic');
          break;
        case 's_close':
          close('strike');
          break;
        case 'link_open': {
          const href = String(child.attrGet('href') ?? '');
          if (!isSafeHref(href)) this.fail(token, `Link target ${href} is not an http(s) or mailto address or a path on this site`);
          const title = child.attrGet('title');
          marks.push({ type: 'link', attrs: { href, ...(title ? { title: String(title) } : {}) } });
          break;
        }
        case 'link_close':
          close('link');
          break;
        case 'math_inline':
          if (child.content.trim() === '') this.fail(token, 'Empty $ formula');
          nodes.push({ type: 'inlineMath', attrs: { latex: child.content } });
          break;
        case 'image': {
          if (!allowImages) this.fail(token, 'Images cannot stand in headings or table cells');
          const title = child.attrGet('title');
          nodes.push({
            type: 'image',
            attrs: { src: String(child.attrGet('src') ?? ''), alt: child.content || null, title: title ? String(title) : null },
          });
          break;
        }
        default:
          this.fail(token, `Inline Markdown ${child.type} is not supported in a page`);
      }
    }
    return nodes;
  }
}

function codeBlock(source: string, language: string | null): JSONContent {
  const text = source.replace(/\n$/, '');
  return { type: 'codeBlock', attrs: { language }, ...(text ? { content: [{ type: 'text', text }] } : {}) };
}

/** Drops whitespace left at the edges of a paragraph split around an image. */
function trimRun(run: JSONContent[]): JSONContent[] {
  const nodes = run.map((node) => ({ ...node }));
  const first = nodes[0];
  if (first?.type === 'text') first.text = first.text!.replace(/^\s+/, '');
  const last = nodes[nodes.length - 1];
  if (last?.type === 'text') last.text = last.text!.replace(/\s+$/, '');
  return nodes.filter((node) => node.type !== 'text' || node.text !== '');
}

function convertBlocks(source: string, lineOffset: number): JSONContent[] {
  const converter = new Converter(markdown.parse(source, {}), lineOffset);
  return converter.blocks(0, null)[0];
}

/**
 * Converts a page written in Markdown into the editor's ProseMirror JSON: CommonMark with
 * pipe tables and ~~strike~~, `$…$` and `$$…$$` math, and fenced `caution` (optional first
 * line `level: warning`) and `calculator` (JSON attributes; `acceptance` may be written as
 * text such as `minWall >= 1.5 mm`) blocks. Raw HTML stays literal text. The result still
 * needs `validateDocument` before it is stored.
 */
export function markdownToDocument(source: string, options: MarkdownToDocumentOptions = {}): LimitbookDocument {
  const content = convertBlocks(source, options.lineOffset ?? 0);
  return { type: 'doc', content: content.length > 0 ? content : [{ type: 'paragraph' }] };
}
