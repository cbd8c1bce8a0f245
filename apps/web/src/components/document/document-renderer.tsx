import { isSafeHref, isSafeImageSrc } from '@limitbook/editor-schema';
import { IconAlertOctagon, IconAlertTriangle, IconDownload, IconInfoCircle, IconPaperclip } from '@tabler/icons-react';
import type { CSSProperties, ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Tex } from '@/components/math/tex';
import { outlineOf, type DocNode, type OutlineEntry } from './outline';
import classes from './document-renderer.module.css';

export type CalculatorRenderer = (attrs: Record<string, unknown>, key: string) => ReactNode;

export type DocumentRendererProps = {
  document: DocNode;
  /** Signed addresses of uploaded files by id (a page's `fileUrls`). */
  fileUrls?: Record<string, string>;
  /** How a calculator block appears; without it, a plain placeholder naming the method. */
  renderCalculator?: CalculatorRenderer;
  /** Added to every heading level: the page title is the h1, so the body starts at h2. */
  headingOffset?: number;
};

type Context = {
  fileUrls: Record<string, string>;
  renderCalculator?: CalculatorRenderer;
  headingOffset: number;
  outline: OutlineEntry[];
  headingIndex: number;
};

const fileIdPattern = /^\/api\/files\/([0-9a-f-]{36})$/i;

function formatBytes(size: number): string {
  if (size < 1024) return `${size} B`;
  if (size < 1024 * 1024) return `${(size / 1024).toFixed(size < 10 * 1024 ? 1 : 0)} KB`;
  return `${(size / 1024 / 1024).toFixed(1)} MB`;
}

function withDownload(url: string): string {
  return `${url}${url.includes('?') ? '&' : '?'}download=1`;
}

/** Only http(s), mailto and paths on this site become links; anything else stays plain text. */
function SafeLink({ href, title, children }: { href: unknown; title?: unknown; children: ReactNode }) {
  if (typeof href !== 'string' || !isSafeHref(href)) return <span className={classes.deadLink}>{children}</span>;
  const label = typeof title === 'string' && title ? title : undefined;
  if (href.startsWith('/') || href.startsWith('#')) {
    return href.startsWith('#') ? (
      <a href={href} title={label}>
        {children}
      </a>
    ) : (
      <Link to={href} title={label}>
        {children}
      </Link>
    );
  }
  if (/^mailto:/i.test(href)) {
    return (
      <a href={href} title={label}>
        {children}
      </a>
    );
  }
  return (
    <a href={href} title={label} target="_blank" rel="noopener noreferrer nofollow" className={classes.external}>
      {children}
    </a>
  );
}

function renderText(node: DocNode, key: string): ReactNode {
  let element: ReactNode = node.text ?? '';
  for (const mark of node.marks ?? []) {
    switch (mark.type) {
      case 'bold':
        element = <strong>{element}</strong>;
        break;
      case 'italic':
        element = <em>{element}</em>;
        break;
      case 'underline':
        element = <u>{element}</u>;
        break;
      case 'strike':
        element = <s>{element}</s>;
        break;
      case 'code':
        element = <code className={classes.inlineCode}>{element}</code>;
        break;
      case 'link':
        element = (
          <SafeLink href={mark.attrs?.href} title={mark.attrs?.title}>
            {element}
          </SafeLink>
        );
        break;
      default:
        break;
    }
  }
  return <span key={key}>{element}</span>;
}

const cautionMeta = {
  warning: { label: 'Warning', icon: IconAlertOctagon },
  caution: { label: 'Caution', icon: IconAlertTriangle },
  note: { label: 'Note', icon: IconInfoCircle },
} as const;

function cellProps(node: DocNode): { colSpan?: number; rowSpan?: number; style?: CSSProperties } {
  const attrs = node.attrs ?? {};
  const align: CSSProperties['textAlign'] = attrs.align === 'left' || attrs.align === 'center' || attrs.align === 'right' ? attrs.align : undefined;
  return {
    colSpan: typeof attrs.colspan === 'number' && attrs.colspan > 1 ? attrs.colspan : undefined,
    rowSpan: typeof attrs.rowspan === 'number' && attrs.rowspan > 1 ? attrs.rowspan : undefined,
    style: align ? { textAlign: align } : undefined,
  };
}

function renderNode(node: DocNode, key: string, context: Context): ReactNode {
  const children = () => (node.content ?? []).map((child, index) => renderNode(child, `${key}.${index}`, context));
  const attrs = node.attrs ?? {};

  switch (node.type) {
    case 'doc':
      return <>{children()}</>;
    case 'text':
      return renderText(node, key);
    case 'paragraph':
      return <p key={key}>{children()}</p>;
    case 'heading': {
      const level = Math.min(6, Math.max(1, Number(attrs.level ?? 1) + context.headingOffset));
      const entry = context.outline[context.headingIndex];
      context.headingIndex += 1;
      const Tag = `h${level}` as 'h2';
      return (
        <Tag key={key} id={entry?.id} className={classes.heading}>
          {children()}
        </Tag>
      );
    }
    case 'bulletList':
      return <ul key={key}>{children()}</ul>;
    case 'orderedList':
      return (
        <ol key={key} start={typeof attrs.start === 'number' && attrs.start !== 1 ? attrs.start : undefined}>
          {children()}
        </ol>
      );
    case 'listItem':
      return <li key={key}>{children()}</li>;
    case 'blockquote':
      return <blockquote key={key}>{children()}</blockquote>;
    case 'codeBlock':
      return (
        <pre key={key} className={classes.codeBlock}>
          <code>{children()}</code>
        </pre>
      );
    case 'horizontalRule':
      return <hr key={key} />;
    case 'hardBreak':
      return <br key={key} />;
    case 'table': {
      const rows = node.content ?? [];
      const headerRow = rows[0]?.content?.every((cell) => cell.type === 'tableHeader') ? rows[0] : undefined;
      const bodyRows = headerRow ? rows.slice(1) : rows;
      return (
        <div key={key} className={classes.tableWrap} role="region" aria-label="Table" tabIndex={0}>
          <table className={classes.table}>
            {headerRow && <thead>{renderNode(headerRow, `${key}.0`, context)}</thead>}
            <tbody>{bodyRows.map((row, index) => renderNode(row, `${key}.${index + (headerRow ? 1 : 0)}`, context))}</tbody>
          </table>
        </div>
      );
    }
    case 'tableRow':
      return <tr key={key}>{children()}</tr>;
    case 'tableHeader':
      return (
        <th key={key} {...cellProps(node)}>
          {children()}
        </th>
      );
    case 'tableCell':
      return (
        <td key={key} {...cellProps(node)}>
          {children()}
        </td>
      );
    case 'image': {
      const src = attrs.src;
      const alt = typeof attrs.alt === 'string' ? attrs.alt : '';
      const title = typeof attrs.title === 'string' ? attrs.title : undefined;
      const fileId = typeof src === 'string' ? fileIdPattern.exec(src)?.[1] : undefined;
      const url = fileId ? context.fileUrls[fileId] : typeof src === 'string' && isSafeImageSrc(src) ? src : undefined;
      return (
        <figure key={key} className={classes.figure}>
          {url ? (
            <img
              src={url}
              alt={alt}
              title={title}
              loading="lazy"
              referrerPolicy="no-referrer"
              width={typeof attrs.width === 'number' ? attrs.width : undefined}
              height={typeof attrs.height === 'number' ? attrs.height : undefined}
            />
          ) : (
            <div className={classes.missing}>Image not available{alt ? `: ${alt}` : ''}</div>
          )}
          {(title || alt) && <figcaption>{title ?? alt}</figcaption>}
        </figure>
      );
    }
    case 'attachment': {
      const fileId = typeof attrs.fileId === 'string' ? attrs.fileId : '';
      const name = typeof attrs.name === 'string' && attrs.name ? attrs.name : 'Attached file';
      const size = typeof attrs.size === 'number' ? attrs.size : 0;
      const url = context.fileUrls[fileId];
      return (
        <div key={key} className={classes.attachment}>
          <IconPaperclip size={18} aria-hidden />
          {url ? (
            <a href={withDownload(url)} download={name} rel="noopener">
              {name}
            </a>
          ) : (
            <span>{name} (not available)</span>
          )}
          <span className={classes.attachmentMeta}>
            {formatBytes(size)}
            {typeof attrs.contentType === 'string' ? ` · ${attrs.contentType}` : ''}
          </span>
          {url && <IconDownload size={16} aria-hidden className={classes.attachmentIcon} />}
        </div>
      );
    }
    case 'inlineMath':
      return <Tex key={key} latex={String(attrs.latex ?? '')} />;
    case 'blockMath':
      return <Tex key={key} latex={String(attrs.latex ?? '')} display className={classes.blockMath} />;
    case 'caution': {
      const level = attrs.level === 'warning' || attrs.level === 'note' ? attrs.level : 'caution';
      const meta = cautionMeta[level];
      return (
        <aside key={key} className={classes.caution} data-level={level} role="note" aria-label={meta.label}>
          <div className={classes.cautionLabel}>
            <meta.icon size={18} aria-hidden />
            {meta.label}
          </div>
          <div className={classes.cautionBody}>{children()}</div>
        </aside>
      );
    }
    case 'calculatorBlock':
      return context.renderCalculator ? (
        <div key={key}>{context.renderCalculator(attrs, key)}</div>
      ) : (
        <div key={key} className={classes.missing}>
          Calculator: {String(attrs.caption || attrs.method)}
        </div>
      );
    default:
      // A node this version does not know: keep its text rather than lose it.
      return node.content ? <div key={key}>{children()}</div> : null;
  }
}

/** A page body (ProseMirror JSON) as React elements: no HTML from the document is ever injected. */
export function DocumentRenderer({ document, fileUrls = {}, renderCalculator, headingOffset = 1 }: DocumentRendererProps) {
  const context: Context = { fileUrls, renderCalculator, headingOffset, outline: outlineOf(document), headingIndex: 0 };
  return <div className={classes.document}>{renderNode(document, 'd', context)}</div>;
}
