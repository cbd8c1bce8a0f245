export { limitbookExtensions, headingLevels, type LimitbookExtensionsOptions, type ReplaceableExtensionName } from './extensions/limitbook-extensions.js';
export { LimitbookLink } from './extensions/link.js';
export { LimitbookImage } from './extensions/image.js';
export { Attachment } from './nodes/attachment.js';
export { CalculatorBlock } from './nodes/calculator-block.js';
export { Caution, cautionLevels, type CautionLevel } from './nodes/caution.js';
export { BlockMath, InlineMath, maxLatexLength } from './nodes/math.js';
export { fileUrl, isSafeHref, isSafeImageSrc, maxUrlLength } from './urls/safe-url.js';
export {
  acceptanceOperators,
  acceptanceRuleSchema,
  formatAcceptanceRule,
  outputPathSchema,
  parseAcceptanceRule,
  type AcceptanceOperator,
  type AcceptanceRule,
  type ParseAcceptanceRuleResult,
} from './calculator/acceptance-rule.js';
export {
  calculatorBlockAttrsSchema,
  calculatorDefaultsSchema,
  inputPathSchema,
  maxCaptionLength,
  maxLockedInputs,
  methodIdSchema,
  type CalculatorBlockAttrs,
  type CalculatorBlockAttrsInput,
} from './calculator/calculator-block-attrs.js';
export { limitbookSchema, type LimitbookDocument } from './validation/limitbook-schema.js';
export { markAttributeSchemas, nodeAttributeSchemas } from './validation/attribute-schemas.js';
export {
  documentLimits,
  maxReportedErrors,
  validateDocument,
  type DocumentError,
  type ValidateDocumentResult,
} from './validation/validate-document.js';
export { extractText, type ExtractTextOptions } from './text/extract-text.js';
export { listCalculatorBlocks } from './text/list-calculator-blocks.js';
