import { TextInput } from '@mantine/core';
import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { displaySrc, useFileUrls } from '../hooks/use-file-urls';
import classes from './file-views.module.css';

export function ImageView({ node, selected, updateAttributes, editor }: ReactNodeViewProps) {
  const urls = useFileUrls();
  const src = String(node.attrs.src ?? '');
  const alt = (node.attrs.alt as string | null) ?? '';
  return (
    <NodeViewWrapper className={classes.figure} data-selected={selected || undefined} data-drag-handle>
      <img src={displaySrc(src, urls)} alt={alt} className={classes.image} width={(node.attrs.width as number | null) ?? undefined} draggable={false} />
      {selected && editor.isEditable && (
        <TextInput
          size="xs"
          mt={6}
          label="Description for readers who cannot see the image"
          placeholder="e.g. Section A–A through port P1"
          value={alt}
          maxLength={300}
          onChange={(event) => updateAttributes({ alt: event.currentTarget.value || null })}
        />
      )}
    </NodeViewWrapper>
  );
}
