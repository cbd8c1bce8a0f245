export { everyNodeDocument, sampleBlockIds, sampleFileId } from './every-node-document.js';
