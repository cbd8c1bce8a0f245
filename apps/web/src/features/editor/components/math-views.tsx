import { NodeViewWrapper, type ReactNodeViewProps } from '@tiptap/react';
import { useState } from 'react';
import { MathFormula } from './math-formula';
import { MathSourcePopover } from './math-source-popover';
import classes from './math.module.css';

function useMathEditing({ node, updateAttributes, deleteNode, editor }: ReactNodeViewProps) {
  const latex = String(node.attrs.latex ?? '');
  // A formula just inserted from the toolbar has no source yet: ask for it straight away.
  const [opened, setOpened] = useState(latex === '' && editor.isEditable);
  return {
    latex,
    opened,
    open: () => editor.isEditable && setOpened(true),
    close: (next: string | null) => {
      setOpened(false);
      const value = next === null ? latex : next.trim();
      if (value === '') deleteNode();
      else if (value !== latex) updateAttributes({ latex: value });
      editor.commands.focus();
    },
    remove: () => {
      setOpened(false);
      deleteNode();
      editor.commands.focus();
    },
  };
}

export function InlineMathView(props: ReactNodeViewProps) {
  const math = useMathEditing(props);
  return (
    <NodeViewWrapper as="span" className={classes.inline} data-selected={props.selected || undefined}>
      <MathSourcePopover latex={math.latex} displayMode={false} opened={math.opened} onOpen={math.open} onClose={math.close} onRemove={math.remove}>
        <span role="button" tabIndex={-1} aria-label={`Formula ${math.latex}. Edit`} className={classes.trigger} onDoubleClick={math.open} onClick={math.open}>
          <MathFormula latex={math.latex} displayMode={false} />
        </span>
      </MathSourcePopover>
    </NodeViewWrapper>
  );
}

export function BlockMathView(props: ReactNodeViewProps) {
  const math = useMathEditing(props);
  return (
    <NodeViewWrapper className={classes.block} data-selected={props.selected || undefined} data-drag-handle>
      <MathSourcePopover latex={math.latex} displayMode opened={math.opened} onOpen={math.open} onClose={math.close} onRemove={math.remove}>
        <div role="button" tabIndex={-1} aria-label={`Block formula ${math.latex}. Edit`} className={classes.trigger} onClick={math.open}>
          <MathFormula latex={math.latex} displayMode />
        </div>
      </MathSourcePopover>
    </NodeViewWrapper>
  );
}
