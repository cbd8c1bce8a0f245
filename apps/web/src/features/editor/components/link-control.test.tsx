import { RichTextEditor } from '@mantine/tiptap';
import { useEditor, type Editor } from '@tiptap/react';
import { useEffect } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { act, render, screen } from '@/testing/render';
import { pageEditorExtensions } from '../lib/editor-extensions';
import { LinkControl, linkAddressError } from './link-control';

let current: Editor | null = null;

function Harness() {
  const editor = useEditor({
    extensions: pageEditorExtensions(),
    content: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'ISO 286-2' }] }] },
    immediatelyRender: true,
  });
  useEffect(() => {
    current = editor;
  }, [editor]);
  return (
    <RichTextEditor editor={editor}>
      <RichTextEditor.Toolbar>
        <LinkControl />
      </RichTextEditor.Toolbar>
      <RichTextEditor.Content />
    </RichTextEditor>
  );
}

afterEach(() => {
  current?.destroy();
  current = null;
});

describe('link control', () => {
  it('refuses a javascript: address at the field and sets nothing; takes a web address', async () => {
    const { user } = render(<Harness />);
    act(() => {
      current!.commands.selectAll();
    });

    await user.click(screen.getByRole('button', { name: 'Link' }));
    const address = await screen.findByRole('textbox', { name: 'Link address' });
    await user.type(address, 'javascript:window.__xss=1');
    await user.click(screen.getByRole('button', { name: 'Apply' }));
    expect(await screen.findByText('This kind of address is not allowed in a page')).toBeInTheDocument();
    expect(JSON.stringify(current!.getJSON())).not.toContain('"link"');

    await user.clear(address);
    await user.type(address, 'https://www.iso.org/standard/45976.html');
    await user.click(screen.getByRole('button', { name: 'Apply' }));
    expect(JSON.stringify(current!.getJSON())).toContain('"href":"https://www.iso.org/standard/45976.html"');
  });

  it('tells allowed addresses from the rest', () => {
    expect(linkAddressError('https://www.asme.org/')).toBeNull();
    expect(linkAddressError('/standards/BW-STD-112')).toBeNull();
    expect(linkAddressError('www.iso.org')).toBeNull();
    expect(linkAddressError('mailto:standards@brackwater.example')).toBeNull();
    for (const hostile of ['javascript:alert(1)', ' JaVaScRiPt:alert(1)', 'data:text/html,<script>alert(1)</script>', 'vbscript:msgbox(1)', '//evil.example']) {
      expect(linkAddressError(hostile)).not.toBeNull();
    }
  });
});
