import { Mark, Node as ProseMirrorNode, type Schema } from '@tiptap/pm/model';
import type { ZodType } from 'zod';
import { limitbookSchema, type LimitbookDocument } from './limitbook-schema.js';
import { markAttributeSchemas, nodeAttributeSchemas } from './attribute-schemas.js';

/** Limits on a stored page; a page beyond any of them is refused as a whole. */
export const documentLimits = {
  maxJsonBytes: 2 * 1024 * 1024,
  maxNodes: 20_000,
  maxDepth: 40,
  maxCalculatorBlocks: 100,
} as const;

/** Validation stops collecting after this many errors. */
export const maxReportedErrors = 50;

/** One reason a document was refused; `path` is the dotted JSON path, e.g. `content.3.attrs.href`. */
export interface DocumentError {
  path: string;
  message: string;
}

export type ValidateDocumentResult = { ok: true; doc: LimitbookDocument } | { ok: false; errors: DocumentError[] };

type JsonObject = Record<string, unknown>;

const nodeFields = new Set(['type', 'attrs', 'content', 'marks', 'text']);
const markFields = new Set(['type', 'attrs']);
// Each node level adds two JSON levels (object, content array); attribute values add a few more.
const maxJsonDepth = documentLimits.maxDepth * 2 + 24;
const maxJsonValues = 1_000_000;

class TooManyErrors extends Error {}

function isPlainObject(value: unknown): value is JsonObject {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return false;
  const prototype = Object.getPrototypeOf(value) as unknown;
  return prototype === Object.prototype || prototype === null;
}

function join(path: string, key: string | number): string {
  return path === '' ? String(key) : `${path}.${key}`;
}

// Bounded and iterative, so hostile nesting (or a cycle) cannot overflow the stack of what
// follows. Shared references are fine: editor JSON shares default attribute objects.
function plainJsonError(json: unknown): string | null {
  const stack: [unknown, number][] = [[json, 0]];
  let values = 0;
  while (stack.length > 0) {
    const [value, depth] = stack.pop()!;
    if (++values > maxJsonValues) return 'Document is too large';
    if (depth > maxJsonDepth) return `Document is nested deeper than ${documentLimits.maxDepth} levels`;
    if (value === null || typeof value === 'string' || typeof value === 'boolean') continue;
    if (typeof value === 'number') {
      if (!Number.isFinite(value)) return 'Document holds a number that is not finite';
      continue;
    }
    if (typeof value !== 'object' || (!Array.isArray(value) && !isPlainObject(value))) return 'Document must be plain JSON data';
    for (const child of Array.isArray(value) ? value : Object.values(value)) stack.push([child, depth + 1]);
  }
  const serialized = JSON.stringify(json);
  // UTF-8 never takes fewer bytes than UTF-16 code units, so the length alone can refuse early.
  if (serialized.length > documentLimits.maxJsonBytes || new TextEncoder().encode(serialized).length > documentLimits.maxJsonBytes) {
    return `Document is larger than ${documentLimits.maxJsonBytes / (1024 * 1024)} MB`;
  }
  return null;
}

class DocumentWalker {
  readonly errors: DocumentError[] = [];
  private nodeCount = 0;
  private calculatorBlockCount = 0;
  private readonly blockIdPaths = new Map<string, string>();

  constructor(private readonly schema: Schema) {}

  fail(path: string, message: string): void {
    this.errors.push({ path, message });
    if (this.errors.length >= maxReportedErrors) throw new TooManyErrors();
  }

  visitNode(value: unknown, path: string, depth: number): void {
    if (!isPlainObject(value)) return this.fail(path, 'A node must be an object');
    if (++this.nodeCount > documentLimits.maxNodes) {
      this.fail('', `Document has more than ${documentLimits.maxNodes} nodes`);
      throw new TooManyErrors();
    }
    if (depth > documentLimits.maxDepth) return this.fail(path, `Nodes are nested deeper than ${documentLimits.maxDepth} levels`);

    for (const key of Object.keys(value)) {
      if (!nodeFields.has(key)) this.fail(join(path, key), `Unknown field ${key} on a node`);
    }
    const { type } = value;
    if (typeof type !== 'string') return this.fail(join(path, 'type'), 'A node needs a type');
    const nodeType = this.schema.nodes[type];
    if (!nodeType || !Object.hasOwn(this.schema.nodes, type)) return this.fail(join(path, 'type'), `Unknown node type ${type}`);
    if (depth === 0 && type !== 'doc') return this.fail(join(path, 'type'), 'The root node must be a doc');

    this.checkAttributes(value.attrs, join(path, 'attrs'), type, nodeType.spec.attrs ?? {}, nodeAttributeSchemas[type]);
    if (type === 'calculatorBlock') this.checkCalculatorBlock(value.attrs, path);

    if (type === 'text') {
      if (typeof value.text !== 'string' || value.text === '') this.fail(join(path, 'text'), 'A text node needs non-empty text');
    } else if ('text' in value) {
      this.fail(join(path, 'text'), `A ${type} node holds no text of its own`);
    }

    if ('marks' in value) {
      if (!Array.isArray(value.marks)) this.fail(join(path, 'marks'), 'Marks must be a list');
      else value.marks.forEach((mark, index) => this.visitMark(mark, join(join(path, 'marks'), index)));
    }

    if ('content' in value) {
      if (!Array.isArray(value.content)) return this.fail(join(path, 'content'), 'Content must be a list of nodes');
      value.content.forEach((child, index) => this.visitNode(child, join(join(path, 'content'), index), depth + 1));
    }
  }

  private visitMark(value: unknown, path: string): void {
    if (!isPlainObject(value)) return this.fail(path, 'A mark must be an object');
    for (const key of Object.keys(value)) {
      if (!markFields.has(key)) this.fail(join(path, key), `Unknown field ${key} on a mark`);
    }
    const { type } = value;
    if (typeof type !== 'string') return this.fail(join(path, 'type'), 'A mark needs a type');
    const markType = this.schema.marks[type];
    if (!markType || !Object.hasOwn(this.schema.marks, type)) return this.fail(join(path, 'type'), `Unknown mark type ${type}`);
    this.checkAttributes(value.attrs, join(path, 'attrs'), type, markType.spec.attrs ?? {}, markAttributeSchemas[type]);
  }

  private checkAttributes(attrs: unknown, path: string, type: string, allowed: object, schema: ZodType | undefined): void {
    if (attrs === undefined && Object.keys(allowed).length === 0) return;
    if (attrs !== undefined && !isPlainObject(attrs)) return this.fail(path, 'Attributes must be an object');
    let unknownFound = false;
    for (const name of Object.keys(attrs ?? {})) {
      if (!Object.hasOwn(allowed, name)) {
        unknownFound = true;
        this.fail(join(path, name), `Unknown attribute ${name} on ${type}`);
      }
    }
    if (unknownFound) return;
    if (!schema) return this.fail(path, `No attribute rules for ${type}`);
    const parsed = schema.safeParse(attrs ?? {});
    if (!parsed.success) {
      for (const issue of parsed.error.issues) this.fail(issue.path.reduce<string>((at, key) => join(at, String(key)), path), issue.message);
    }
  }

  private checkCalculatorBlock(attrs: unknown, path: string): void {
    if (++this.calculatorBlockCount === documentLimits.maxCalculatorBlocks + 1) {
      this.fail(path, `A page holds at most ${documentLimits.maxCalculatorBlocks} calculator blocks`);
    }
    const blockId = isPlainObject(attrs) ? attrs.blockId : undefined;
    if (typeof blockId !== 'string') return;
    const firstPath = this.blockIdPaths.get(blockId);
    if (firstPath !== undefined) this.fail(join(join(path, 'attrs'), 'blockId'), `Block id ${blockId} is already used at ${firstPath}`);
    else this.blockIdPaths.set(blockId, path);
  }
}

function structureErrors(node: ProseMirrorNode, path: string, errors: DocumentError[]): void {
  if (errors.length >= maxReportedErrors) return;
  if (!node.type.contentMatch.matchFragment(node.content)?.validEnd) {
    const children = node.content.content.map((child) => child.type.name);
    errors.push({
      path,
      message: children.length === 0 ? `A ${node.type.name} cannot be empty` : `A ${node.type.name} cannot hold ${children.join(', ')}`,
    });
  }
  let markSet = Mark.none;
  for (const mark of node.marks) markSet = mark.addToSet(markSet);
  if (!Mark.sameSet(markSet, node.marks)) errors.push({ path: join(path, 'marks'), message: 'Marks are repeated or exclude each other' });
  node.forEach((child, _offset, index) => {
    const childPath = join(join(path, 'content'), index);
    if (!node.type.allowsMarks(child.marks)) {
      errors.push({ path: join(childPath, 'marks'), message: `A ${node.type.name} does not allow ${child.marks.map((mark) => mark.type.name).join(', ')}` });
    }
    structureErrors(child, childPath, errors);
  });
}

/**
 * Validates a page body before it is stored: plain JSON within `documentLimits`, only
 * known node and mark types, only their known attributes with allowed values (safe URLs,
 * strictly typed calculator blocks with unique `blockId`s), and content the schema allows.
 * Returns the document normalised by ProseMirror (defaults filled in), or every error
 * found, each with the JSON path of the offending node, mark or attribute.
 */
export function validateDocument(json: unknown, schema: Schema = limitbookSchema()): ValidateDocumentResult {
  const jsonError = plainJsonError(json);
  if (jsonError) return { ok: false, errors: [{ path: '', message: jsonError }] };

  const walker = new DocumentWalker(schema);
  try {
    walker.visitNode(json, '', 0);
  } catch (error) {
    if (!(error instanceof TooManyErrors)) throw error;
  }
  if (walker.errors.length > 0) return { ok: false, errors: walker.errors };

  let doc: ProseMirrorNode;
  try {
    doc = ProseMirrorNode.fromJSON(schema, json);
  } catch (error) {
    return { ok: false, errors: [{ path: '', message: error instanceof Error ? error.message : 'Not a valid document' }] };
  }
  const errors: DocumentError[] = [];
  structureErrors(doc, '', errors);
  if (errors.length > 0) return { ok: false, errors };
  try {
    doc.check();
  } catch (error) {
    return { ok: false, errors: [{ path: '', message: error instanceof Error ? error.message : 'Not a valid document' }] };
  }
  return { ok: true, doc: doc.toJSON() as LimitbookDocument };
}
