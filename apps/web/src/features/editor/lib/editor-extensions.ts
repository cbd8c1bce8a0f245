import { Attachment, BlockMath, CalculatorBlock, Caution, InlineMath, LimitbookImage, limitbookExtensions } from '@limitbook/editor-schema';
import { Placeholder } from '@tiptap/extensions';
import { ReactNodeViewRenderer, type AnyExtension } from '@tiptap/react';
import { AttachmentView } from '../components/attachment-view';
import { CalculatorBlockView } from '../components/calculator-block-view';
import { CautionView } from '../components/caution-view';
import { ImageView } from '../components/image-view';
import { BlockMathView, InlineMathView } from '../components/math-views';

/**
 * The page editor's extensions: the shared schema the server validates against, with
 * React views for the custom nodes. The views change how nodes look, never what is stored.
 */
export function pageEditorExtensions({ placeholder = 'Write the standard: purpose, scope, rule, method, worked example…' } = {}): AnyExtension[] {
  return [
    ...limitbookExtensions({
      replace: {
        calculatorBlock: CalculatorBlock.extend({ addNodeView: () => ReactNodeViewRenderer(CalculatorBlockView) }),
        caution: Caution.extend({ addNodeView: () => ReactNodeViewRenderer(CautionView) }),
        inlineMath: InlineMath.extend({ addNodeView: () => ReactNodeViewRenderer(InlineMathView, { as: 'span' }) }),
        blockMath: BlockMath.extend({ addNodeView: () => ReactNodeViewRenderer(BlockMathView) }),
        image: LimitbookImage.extend({ addNodeView: () => ReactNodeViewRenderer(ImageView) }),
        attachment: Attachment.extend({ addNodeView: () => ReactNodeViewRenderer(AttachmentView) }),
      },
    }),
    Placeholder.configure({ placeholder, showOnlyWhenEditable: true }),
  ];
}
