import { getSchema, type JSONContent } from '@tiptap/core';
import type { Schema } from '@tiptap/pm/model';
import { limitbookExtensions } from '../extensions/limitbook-extensions.js';

/** A page body as stored: ProseMirror JSON whose root is a `doc` node. */
export type LimitbookDocument = JSONContent & { type: 'doc' };

let schema: Schema | undefined;

/** The ProseMirror schema built from `limitbookExtensions()`, built once. */
export function limitbookSchema(): Schema {
  schema ??= getSchema(limitbookExtensions());
  return schema;
}
