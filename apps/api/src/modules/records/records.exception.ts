import { AppException } from '../../common/errors/app.exception.js';

export type RecordsErrorReason =
  | 'record-not-found'
  | 'revision-not-found'
  | 'revision-not-released'
  | 'block-not-found'
  | 'all-records-admin-only'
  | 'report-not-found'
  | 'page-not-found';

const byReason: Record<RecordsErrorReason, () => AppException> = {
  'record-not-found': () => new AppException(404, 'NOT_FOUND', 'No calculation record with this id.'),
  'revision-not-found': () => new AppException(404, 'NOT_FOUND', 'This page has no published revision with this id.', { revisionId: 'No such revision on this page' }),
  'revision-not-released': () =>
    new AppException(400, 'VALIDATION_FAILED', 'Records are made on published revisions only, not on drafts.', { revisionId: 'This revision is not published' }),
  'block-not-found': () => new AppException(404, 'NOT_FOUND', 'This revision has no calculator block with this id.', { blockId: 'No such block in this revision' }),
  'all-records-admin-only': () => new AppException(403, 'FORBIDDEN', "Only admins may list everyone's records."),
  'report-not-found': () => new AppException(404, 'NOT_FOUND', 'No impact report with this id.'),
  'page-not-found': () => new AppException(404, 'NOT_FOUND', 'No page with this id.'),
};

export class RecordsException {
  static of(reason: RecordsErrorReason): AppException {
    return byReason[reason]();
  }

  /** A locked input the client tried to change: named so the form can point at it. */
  static lockedInputChanged(paths: string[]): AppException {
    return new AppException(
      400,
      'VALIDATION_FAILED',
      `The page fixes ${paths.length === 1 ? 'this input' : 'these inputs'}: ${paths.join(', ')}. Records use the page's values.`,
      Object.fromEntries(paths.map((path) => [`inputs.${path}`, 'Locked by the page; it cannot be changed'])),
    );
  }

  static lockedUnitChanged(blockUnit: string): AppException {
    return new AppException(400, 'VALIDATION_FAILED', `This block's locked values are in ${blockUnit}; record it in ${blockUnit}.`, {
      unit: `Use ${blockUnit}, the unit of the block's locked values`,
    });
  }
}
