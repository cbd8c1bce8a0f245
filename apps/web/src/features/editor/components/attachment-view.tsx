import { fileUrl } from '@limitbook/editor-schema';
import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { IconFileTypeCsv, IconFileTypePdf, IconPaperclip, IconPhoto } from '@tabler/icons-react';
import { formatBytes } from '../lib/format-bytes';
import { displaySrc, useFileUrls } from '../hooks/use-file-urls';
import classes from './file-views.module.css';

function FileIcon({ contentType }: { contentType: string }) {
  const props = { size: 22, 'aria-hidden': true, className: classes.attachmentIcon };
  if (contentType === 'application/pdf') return <IconFileTypePdf {...props} />;
  if (contentType === 'text/csv') return <IconFileTypeCsv {...props} />;
  if (contentType.startsWith('image/')) return <IconPhoto {...props} />;
  return <IconPaperclip {...props} />;
}

export function AttachmentView({ node, selected }: ReactNodeViewProps) {
  const urls = useFileUrls();
  const { fileId, name, size, contentType } = node.attrs as { fileId: string; name: string; size: number; contentType: string };
  const href = displaySrc(fileUrl(fileId), urls);
  return (
    <NodeViewWrapper className={classes.attachment} data-selected={selected || undefined} data-drag-handle>
      <FileIcon contentType={contentType} />
      <a href={`${href}${href.includes('?') ? '&' : '?'}download=1`} className={classes.attachmentName} target="_blank" rel="noopener noreferrer" draggable={false}>
        {name}
      </a>
      <span className={classes.attachmentMeta}>{formatBytes(size)}</span>
    </NodeViewWrapper>
  );
}
