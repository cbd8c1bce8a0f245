export { markdownToDocument, MarkdownConversionError, type MarkdownToDocumentOptions } from './markdown-to-document.js';
