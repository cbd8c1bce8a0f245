import { maxTableImportBytes } from '@limitbook/contracts';
import { singleFileUpload } from '../../common/uploads/single-file-upload.js';
import { MeasurementsException } from './measurements.exception.js';

/** A table's CSV, within the import limit (smaller than general uploads: it is parsed inline). */
export const CsvUploadInterceptor = singleFileUpload(maxTableImportBytes, {
  tooLarge: () => MeasurementsException.of('too-large'),
  tooManyParts: () => MeasurementsException.of('too-many-parts'),
  noFile: () => MeasurementsException.of('no-file'),
});
