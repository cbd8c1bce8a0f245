import { maxTableImportBytes } from '@limitbook/contracts';
import { AppException } from '../../common/errors/app.exception.js';

export type MeasurementsErrorReason = 'no-file' | 'too-large' | 'too-many-parts' | 'empty';

const limitText = `${maxTableImportBytes / (1024 * 1024)} MB`;

const byReason: Record<MeasurementsErrorReason, () => AppException> = {
  'no-file': () => new AppException(400, 'VALIDATION_FAILED', 'Send the CSV as multipart/form-data in a field named file.', { file: 'A CSV file is required' }),
  'too-large': () =>
    new AppException(413, 'PAYLOAD_TOO_LARGE', `CSV imports may be at most ${limitText}; split the table or remove unused columns.`, { file: `Larger than ${limitText}` }),
  'too-many-parts': () => new AppException(400, 'VALIDATION_FAILED', 'Send one file per request, in a field named file.', { file: 'One file only' }),
  empty: () => new AppException(400, 'VALIDATION_FAILED', 'The file is empty: it needs a header line and at least one row.', { file: 'The file is empty' }),
};

/** Refusals of a table import: the whole file, with the message at the `file` field. */
export class MeasurementsException {
  static of(reason: MeasurementsErrorReason): AppException {
    return byReason[reason]();
  }

  static unreadable(message: string): AppException {
    return new AppException(400, 'VALIDATION_FAILED', message, { file: message });
  }

  static unknownTable(method: string, input: string): AppException {
    return new AppException(404, 'NOT_FOUND', `Method "${method}" has no table input "${input}" that imports CSV.`, { input: 'No importable table of this name' });
  }
}
