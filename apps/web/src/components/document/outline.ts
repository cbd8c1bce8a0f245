/** A ProseMirror JSON node as stored in a page. */
export type DocNode = {
  type: string;
  attrs?: Record<string, unknown>;
  content?: DocNode[];
  text?: string;
  marks?: { type: string; attrs?: Record<string, unknown> }[];
};

export type OutlineEntry = { id: string; level: number; text: string };

export function textOf(node: DocNode): string {
  if (node.type === 'text') return node.text ?? '';
  if (node.type === 'inlineMath') return String(node.attrs?.latex ?? '');
  return (node.content ?? []).map(textOf).join('');
}

function slug(text: string): string {
  return (
    text
      .toLowerCase()
      .normalize('NFKD')
      .replace(/[\u0300-\u036f]/g, '')
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'section'
  );
}

/** The page's headings in order with unique anchors; the renderer gives the same ids to the same headings. */
export function outlineOf(document: DocNode): OutlineEntry[] {
  const entries: OutlineEntry[] = [];
  const used = new Map<string, number>();
  const walk = (node: DocNode) => {
    if (node.type === 'heading') {
      const text = textOf(node).trim();
      const base = `s-${slug(text)}`;
      const count = used.get(base) ?? 0;
      used.set(base, count + 1);
      entries.push({ id: count === 0 ? base : `${base}-${count + 1}`, level: Number(node.attrs?.level ?? 1), text });
      return;
    }
    node.content?.forEach(walk);
  };
  walk(document);
  return entries;
}
