import { limitbookExtensions } from '@limitbook/editor-schema';
import { Editor, type JSONContent } from '@tiptap/react';
import { act, renderHook, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse } from '@/testing/render';
import { draftPage } from '../testing/fixtures';
import { createFileUrls } from './use-file-urls';
import { useDraftSession } from './use-draft-session';

type Sent = { method: string; url: string; body: unknown };

let editor: Editor;
let sent: Sent[];
let answers: Array<(call: Sent) => Response>;

const conflict = (version: number) => () =>
  jsonResponse(409, {
    statusCode: 409,
    code: 'CONFLICT',
    message: `Someone saved this draft since you opened it; it is now at version ${version}.`,
    fields: { baseVersion: `The draft is at version ${version}` },
    current: { version, updatedAt: '2026-03-02T10:05:00.000Z', updatedBy: null },
  });

beforeEach(() => {
  editor = new Editor({ extensions: limitbookExtensions(), content: draftPage(3).revision.document as JSONContent });
  sent = [];
  answers = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
      const call = { method: init?.method ?? 'GET', url: String(input), body: init?.body ? JSON.parse(String(init.body)) : undefined };
      sent.push(call);
      const answer = answers.shift();
      if (!answer) throw new Error(`Unexpected ${call.method} ${call.url}`);
      return answer(call);
    }),
  );
});

afterEach(() => {
  editor.destroy();
  vi.unstubAllGlobals();
});

function typeIntoEditor(text: string) {
  act(() => {
    editor.commands.insertContentAt(editor.state.doc.content.size, { type: 'paragraph', content: [{ type: 'text', text }] });
  });
}

describe('draft session', () => {
  it('saves against the version it started from and moves to the version the server gives back', async () => {
    const { result } = renderHook(() => useDraftSession(editor, draftPage(3), createFileUrls()));
    expect(result.current.dirty).toBe(false);
    typeIntoEditor('Scope: ports near the main bore.');
    expect(result.current.dirty).toBe(true);

    answers.push(() => jsonResponse(200, draftPage(4)));
    await act(() => result.current.save());

    expect(sent[0]).toMatchObject({ method: 'PUT', url: '/api/pages/0b7d1e9a-4c2f-4e8b-9a6d-3f5e7c1b2a90/draft', body: { baseVersion: 3, title: 'Port walls' } });
    expect(result.current.state.baseVersion).toBe(4);
    expect(result.current.dirty).toBe(false);
  });

  it('on 409 keeps the local copy and the base version until the author decides; "keep my copy" then overwrites the latest version', async () => {
    const { result } = renderHook(() => useDraftSession(editor, draftPage(3), createFileUrls()));
    typeIntoEditor('My paragraph.');

    answers.push(conflict(5), () => jsonResponse(200, draftPage(5, 'Their paragraph.', 'Port walls (theirs)')));
    await act(() => result.current.save());

    expect(result.current.state.conflict?.message).toMatch(/version 5/);
    expect(result.current.state.conflict?.latest?.revision.title).toBe('Port walls (theirs)');
    expect(result.current.state.baseVersion).toBe(3);
    expect(result.current.dirty).toBe(true);
    // No further save goes out while the conflict is open.
    await act(async () => expect(await result.current.save()).toBe(false));
    expect(sent).toHaveLength(2);

    await act(() => result.current.keepMine());
    expect(result.current.state.conflict).toBeNull();
    expect(result.current.state.overwriting).toMatchObject({ version: 5 });
    expect(result.current.state.baseVersion).toBe(5);
    expect(editor.getText()).toContain('My paragraph.');
    expect(result.current.dirty).toBe(true);

    answers.push(() => jsonResponse(200, draftPage(6, 'My paragraph.')));
    await act(() => result.current.save());
    expect(sent[2]).toMatchObject({ method: 'PUT', body: { baseVersion: 5 } });
    expect(JSON.stringify(sent[2]?.body)).toContain('My paragraph.');
    expect(result.current.state.overwriting).toBeNull();
    expect(result.current.state.baseVersion).toBe(6);
  });

  it('"reload the latest" replaces the local copy with the server\'s and is clean afterwards', async () => {
    const { result } = renderHook(() => useDraftSession(editor, draftPage(3), createFileUrls()));
    typeIntoEditor('My paragraph.');
    answers.push(conflict(5), () => jsonResponse(200, draftPage(5, 'Their paragraph.', 'Port walls (theirs)')));
    await act(() => result.current.save());

    answers.push(() => jsonResponse(200, draftPage(5, 'Their paragraph.', 'Port walls (theirs)')));
    await act(() => result.current.reloadLatest());
    await waitFor(() => expect(result.current.state.conflict).toBeNull());
    expect(editor.getText()).toBe('Their paragraph.');
    expect(result.current.title).toBe('Port walls (theirs)');
    expect(result.current.state.baseVersion).toBe(5);
    expect(result.current.dirty).toBe(false);
  });

  it('keeps the server\'s field messages when it refuses the page body', async () => {
    const { result } = renderHook(() => useDraftSession(editor, draftPage(3), createFileUrls()));
    typeIntoEditor('x');
    answers.push(() =>
      jsonResponse(400, {
        statusCode: 400,
        code: 'VALIDATION_FAILED',
        message: 'The page body holds content the editor does not allow.',
        fields: { 'document.content.1.attrs.method': 'Method id is required' },
      }),
    );
    await act(() => result.current.save());
    expect(result.current.state.refused?.fields).toEqual({ 'document.content.1.attrs.method': 'Method id is required' });
    expect(result.current.state.baseVersion).toBe(3);
    expect(result.current.dirty).toBe(true);
  });
});
