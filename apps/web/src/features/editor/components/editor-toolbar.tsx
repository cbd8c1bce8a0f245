import { fileUrl } from '@limitbook/editor-schema';
import { RichTextEditor, useRichTextEditorContext } from '@mantine/tiptap';
import { useEditorState } from '@tiptap/react';
import { IconAlertTriangle, IconCalculator, IconMathFunction, IconPaperclip, IconPhoto, IconSum } from '@tabler/icons-react';
import { useFileUrls } from '../hooks/use-file-urls';
import { insertBesideSelection } from '../lib/insert-block';
import { LinkControl } from './link-control';
import { UploadControl } from './upload-control';
import classes from './page-editor.module.css';

const imageTypes = ['image/png', 'image/jpeg', 'image/gif', 'image/webp'] as const;
const attachmentTypes = ['application/pdf', 'text/csv', ...imageTypes] as const;

export function EditorToolbar() {
  const { editor } = useRichTextEditorContext();
  const fileUrls = useFileUrls();
  const inTable = useEditorState({ editor, selector: ({ editor: current }) => !!current?.isActive('table') }) ?? false;
  if (!editor) return null;

  return (
    <RichTextEditor.Toolbar sticky stickyOffset={0} className={classes.toolbar} aria-label="Formatting">
      <RichTextEditor.ControlsGroup>
        <RichTextEditor.H1 />
        <RichTextEditor.H2 />
        <RichTextEditor.H3 />
        <RichTextEditor.H4 />
      </RichTextEditor.ControlsGroup>
      <RichTextEditor.ControlsGroup>
        <RichTextEditor.Bold />
        <RichTextEditor.Italic />
        <RichTextEditor.Underline />
        <RichTextEditor.Strikethrough />
        <RichTextEditor.Code />
        <RichTextEditor.ClearFormatting />
      </RichTextEditor.ControlsGroup>
      <RichTextEditor.ControlsGroup>
        <RichTextEditor.BulletList />
        <RichTextEditor.OrderedList />
        <RichTextEditor.Blockquote />
        <RichTextEditor.CodeBlock />
        <RichTextEditor.Hr />
      </RichTextEditor.ControlsGroup>
      <RichTextEditor.ControlsGroup>
        <LinkControl />
        <RichTextEditor.Unlink />
      </RichTextEditor.ControlsGroup>
      <RichTextEditor.ControlsGroup>
        <RichTextEditor.TableInsert />
        {inTable && (
          <>
            <RichTextEditor.TableRowBefore />
            <RichTextEditor.TableRowAfter />
            <RichTextEditor.TableRowDelete />
            <RichTextEditor.TableColumnBefore />
            <RichTextEditor.TableColumnAfter />
            <RichTextEditor.TableColumnDelete />
            <RichTextEditor.TableToggleHeaderRow />
            <RichTextEditor.TableDelete />
          </>
        )}
      </RichTextEditor.ControlsGroup>
      <RichTextEditor.ControlsGroup>
        <UploadControl
          label="Upload image"
          icon={<IconPhoto size={16} stroke={1.6} />}
          accept={imageTypes}
          onUploaded={(file) => {
            fileUrls.set(file.id, file.signedUrl);
            insertBesideSelection(editor, { type: 'image', attrs: { src: fileUrl(file.id), alt: file.name.replace(/\.[^.]+$/, '') } });
          }}
        />
        <UploadControl
          label="Attach file"
          icon={<IconPaperclip size={16} stroke={1.6} />}
          accept={attachmentTypes}
          onUploaded={(file) => {
            fileUrls.set(file.id, file.signedUrl);
            insertBesideSelection(editor, { type: 'attachment', attrs: { fileId: file.id, name: file.name, size: file.size, contentType: file.contentType } });
          }}
        />
      </RichTextEditor.ControlsGroup>
      <RichTextEditor.ControlsGroup>
        <RichTextEditor.Control
          aria-label="Inline formula"
          title="Inline formula (LaTeX)"
          onClick={() => insertBesideSelection(editor, { type: 'inlineMath', attrs: { latex: '' } })}
        >
          <IconMathFunction size={16} stroke={1.6} />
        </RichTextEditor.Control>
        <RichTextEditor.Control
          aria-label="Block formula"
          title="Block formula (LaTeX)"
          onClick={() => insertBesideSelection(editor, { type: 'blockMath', attrs: { latex: '' } })}
        >
          <IconSum size={16} stroke={1.6} />
        </RichTextEditor.Control>
        <RichTextEditor.Control
          aria-label="Caution callout"
          title="Caution callout"
          active={editor.isActive('caution')}
          onClick={() => {
            const chain = editor.chain().focus();
            if (!editor.isActive('caution') && !chain.wrapIn('caution', { level: 'caution' }).run()) {
              insertBesideSelection(editor, { type: 'caution', attrs: { level: 'caution' }, content: [{ type: 'paragraph' }] });
            } else if (editor.isActive('caution')) {
              editor.chain().focus().lift('caution').run();
            }
          }}
        >
          <IconAlertTriangle size={16} stroke={1.6} />
        </RichTextEditor.Control>
      </RichTextEditor.ControlsGroup>
      <RichTextEditor.ControlsGroup>
        <RichTextEditor.Control
          aria-label="Insert calculator"
          title="Insert calculator"
          className={classes.calculatorControl}
          onClick={() => insertBesideSelection(editor, { type: 'calculatorBlock', attrs: { method: '' } })}
        >
          <IconCalculator size={16} stroke={1.6} />
          <span>Calculator</span>
        </RichTextEditor.Control>
      </RichTextEditor.ControlsGroup>
      <RichTextEditor.ControlsGroup className={classes.history}>
        <RichTextEditor.Undo />
        <RichTextEditor.Redo />
      </RichTextEditor.ControlsGroup>
    </RichTextEditor.Toolbar>
  );
}
