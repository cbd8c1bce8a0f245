import { validateDocument } from '@limitbook/editor-schema';
import { EditorContent, useEditor, type Editor } from '@tiptap/react';
import { useEffect } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, jsonResponse, render, screen, waitFor, within } from '@/testing/render';
import { createFileUrls, FileUrlsContext } from '../hooks/use-file-urls';
import { pageEditorExtensions } from '../lib/editor-extensions';
import { wallMethod, wallResult } from '../testing/fixtures';

let current: Editor | null = null;

function EditorHarness() {
  const editor = useEditor({ extensions: pageEditorExtensions(), content: { type: 'doc', content: [{ type: 'paragraph' }] }, immediatelyRender: true });
  useEffect(() => {
    current = editor;
  }, [editor]);
  return (
    <FileUrlsContext.Provider value={createFileUrls()}>
      <EditorContent editor={editor} />
    </FileUrlsContext.Provider>
  );
}

function blockAttrs() {
  const block = current!.getJSON().content?.find((node) => node.type === 'calculatorBlock');
  return block?.attrs as { method: string; defaults: Record<string, unknown>; locked: string[]; acceptance: unknown; caption: string };
}

beforeEach(() => {
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL) => {
      const url = String(input);
      if (url.endsWith('/api/methods')) return jsonResponse(200, { items: [wallMethod] });
      if (url.includes('/evaluate')) return jsonResponse(200, wallResult);
      return jsonResponse(404, { statusCode: 404, code: 'NOT_FOUND', message: 'No such thing' });
    }),
  );
});

afterEach(() => {
  current?.destroy();
  current = null;
  vi.unstubAllGlobals();
});

describe('calculator block in the page editor', () => {
  it('inserting a block, picking a method, setting a default and a lock, a rule and a caption updates the node, and the page passes the server schema', async () => {
    const { user } = render(<EditorHarness />);
    act(() => {
      current!.commands.insertCalculatorBlock({ method: '' });
    });

    const block = await screen.findByRole('group', { name: /Calculator/ });
    await user.click(within(block).getByRole('combobox', { name: 'Method' }));
    await user.click(await screen.findByRole('option', { name: wallMethod.title }));
    expect(blockAttrs().method).toBe('wall-thickness');

    const tolerance = await within(block).findByRole('textbox', { name: /Position tolerance/ });
    await user.type(tolerance, '0.2');
    await user.tab();
    await waitFor(() => expect(blockAttrs().defaults.positionTolerance).toBe(0.2));

    await user.click(within(block).getByRole('button', { name: 'Lock Position tolerance for readers' }));
    expect(blockAttrs().locked).toEqual(['positionTolerance']);
    expect(within(block).getByRole('button', { name: 'Unlock Position tolerance for readers' })).toHaveAttribute('aria-pressed', 'true');

    const rule = within(block).getByRole('combobox', { name: /Acceptance rule/ });
    await user.type(rule, 'minWall >= oops');
    expect(within(block).getByText(/Write the rule as/)).toBeInTheDocument();
    expect(blockAttrs().acceptance).toBeNull();
    await user.clear(rule);
    await user.type(rule, 'minWall >= 1.5 mm');
    expect(blockAttrs().acceptance).toEqual({ output: 'minWall', operator: '>=', value: 1.5, unit: 'mm' });

    await user.click(within(block).getByRole('textbox', { name: /Caption/ }));
    await user.paste('<img src=x onerror=window.__xss=1>');
    expect(blockAttrs().caption).toBe('<img src=x onerror=window.__xss=1>');

    const checked = validateDocument(current!.getJSON());
    expect(checked.ok ? [] : checked.errors).toEqual([]);
  }, 60_000);

  it('drops a lock when its default is cleared, so the page never holds a lock the server refuses', async () => {
    const { user } = render(<EditorHarness />);
    act(() => {
      current!.commands.insertCalculatorBlock({ method: 'wall-thickness', defaults: { positionTolerance: 0.2 }, locked: ['positionTolerance'] });
    });
    const block = await screen.findByRole('group', { name: new RegExp(wallMethod.title) });
    await user.click(within(block).getByRole('button', { name: 'Edit settings' }));
    const tolerance = await within(block).findByRole('textbox', { name: /Position tolerance/ });
    await user.clear(tolerance);
    await user.tab();
    await waitFor(() => expect(blockAttrs().locked).toEqual([]));
    expect(validateDocument(current!.getJSON()).ok).toBe(true);
  });
});
