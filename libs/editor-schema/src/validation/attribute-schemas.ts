import { z } from 'zod';
import { uuidSchema } from '@limitbook/contracts';
import { calculatorBlockAttrsSchema } from '../calculator/calculator-block-attrs.js';
import { headingLevels } from '../extensions/limitbook-extensions.js';
import { cautionLevels } from '../nodes/caution.js';
import { maxLatexLength } from '../nodes/math.js';
import { isSafeHref, isSafeImageSrc } from '../urls/safe-url.js';

const noAttributes = z.strictObject({});
const shortText = (max: number) => z.string().max(max, `Must be at most ${max} characters`);
const dimension = z.number().int().positive().max(100_000).nullable();
const cellAttributes = z.strictObject({
  colspan: z.number().int().min(1).max(100).optional(),
  rowspan: z.number().int().min(1).max(1_000).optional(),
  colwidth: z.array(z.number().int().min(0).max(10_000)).max(100).nullable().optional(),
  align: z.enum(['left', 'center', 'right']).nullable().optional(),
});
const latexAttributes = z.strictObject({
  latex: z.string().min(1, 'Formula is empty').max(maxLatexLength, `Formula must be at most ${maxLatexLength} characters`),
});

/**
 * Allowed attributes of every node type, checked on the raw JSON because ProseMirror drops
 * unknown attributes silently. Attributes left out take the schema's default.
 */
export const nodeAttributeSchemas: Record<string, z.ZodType> = {
  doc: noAttributes,
  text: noAttributes,
  paragraph: noAttributes,
  blockquote: noAttributes,
  bulletList: noAttributes,
  listItem: noAttributes,
  hardBreak: noAttributes,
  horizontalRule: noAttributes,
  table: noAttributes,
  tableRow: noAttributes,
  heading: z.strictObject({
    level: z.union(headingLevels.map((level) => z.literal(level)), { message: `Heading level must be ${headingLevels.join(', ')}` }).optional(),
  }),
  codeBlock: z.strictObject({
    language: z.string().regex(/^[A-Za-z0-9+#._-]{1,40}$/, 'Unknown code language').nullable().optional(),
  }),
  orderedList: z.strictObject({
    start: z.number().int().min(0).max(1_000_000).optional(),
    type: z.enum(['1', 'a', 'A', 'i', 'I']).nullable().optional(),
  }),
  tableHeader: cellAttributes,
  tableCell: cellAttributes,
  image: z.strictObject({
    src: z.string().refine(isSafeImageSrc, 'Image must be an uploaded file (/api/files/…) or an http(s) address'),
    alt: shortText(1_000).nullable().optional(),
    title: shortText(1_000).nullable().optional(),
    width: dimension.optional(),
    height: dimension.optional(),
  }),
  attachment: z.strictObject({
    fileId: uuidSchema,
    name: z.string().min(1, 'File name is required').max(255, 'File name is too long'),
    size: z.number().int().min(0),
    contentType: z.string().max(255).regex(/^[a-z0-9!#$&^_.+-]+\/[a-z0-9!#$&^_.+-]+$/i, 'Not a content type'),
  }),
  inlineMath: latexAttributes,
  blockMath: latexAttributes,
  caution: z.strictObject({
    level: z.enum(cautionLevels, { message: `Caution level must be one of ${cautionLevels.join(', ')}` }).optional(),
  }),
  calculatorBlock: calculatorBlockAttrsSchema,
};

/** Allowed attributes of every mark type. */
export const markAttributeSchemas: Record<string, z.ZodType> = {
  bold: noAttributes,
  italic: noAttributes,
  underline: noAttributes,
  strike: noAttributes,
  code: noAttributes,
  link: z.strictObject({
    href: z.string().refine(isSafeHref, 'Link must be an http(s) or mailto address or a path on this site'),
    target: z.enum(['_blank', '_self']).nullable().optional(),
    rel: z.string().regex(/^[a-z]+( [a-z]+)*$/, 'Not a link relation').max(100).nullable().optional(),
    title: shortText(1_000).nullable().optional(),
  }),
};
