import { maxUploadBytes } from '@limitbook/contracts';
import { singleFileUpload } from '../../common/uploads/single-file-upload.js';
import { FilesException } from './files.exception.js';

/** Page attachments and images, within the general upload limit. */
export const UploadInterceptor = singleFileUpload(maxUploadBytes, {
  tooLarge: () => FilesException.of('too-large'),
  tooManyParts: () => FilesException.of('too-many-parts'),
  noFile: () => FilesException.of('no-file'),
});
