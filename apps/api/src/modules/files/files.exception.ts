import { maxUploadBytes } from '@limitbook/contracts';
import { AppException } from '../../common/errors/app.exception.js';

export type FilesErrorReason = 'not-found' | 'no-file' | 'too-large' | 'too-many-parts' | 'bad-signature' | 'missing-bytes';

const megabytes = maxUploadBytes / (1024 * 1024);

const byReason: Record<FilesErrorReason, () => AppException> = {
  'not-found': () => new AppException(404, 'NOT_FOUND', 'No file with this id.'),
  'no-file': () =>
    new AppException(400, 'VALIDATION_FAILED', 'Send the file as multipart/form-data in a field named file.', { file: 'A file is required' }),
  'too-large': () => new AppException(413, 'PAYLOAD_TOO_LARGE', `Files may be at most ${megabytes} MB.`, { file: `Larger than ${megabytes} MB` }),
  'too-many-parts': () => new AppException(400, 'VALIDATION_FAILED', 'Send one file per request, in a field named file.', { file: 'One file only' }),
  'bad-signature': () => new AppException(403, 'FORBIDDEN', 'This file link is not valid or has expired. Open the page again for a fresh one.'),
  'missing-bytes': () => new AppException(404, 'NOT_FOUND', 'The file is listed but its content is missing from storage.'),
};

export class FilesException {
  static of(reason: FilesErrorReason): AppException {
    return byReason[reason]();
  }

  static refusedType(message: string): AppException {
    return new AppException(415, 'UNSUPPORTED_MEDIA_TYPE', message, { file: message });
  }
}
