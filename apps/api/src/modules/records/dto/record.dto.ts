import { type CalculationRecord, type ImpactReport } from '@limitbook/contracts';
import { type ImpactReportRow } from '../../../database/schema/index.js';
import { type PersonColumns, type RecordView } from '../records.repository.js';

export function toCalculationRecord(view: RecordView): CalculationRecord {
  const { record } = view;
  return {
    id: record.id,
    page: { id: record.pageId, documentNumber: view.documentNumber, title: view.revisionTitle },
    revision: { id: record.revisionId, sequence: view.revisionSequence, revisionLetter: view.revisionLetter, state: view.revisionState },
    blockId: record.blockId,
    method: record.methodId,
    methodVersion: record.methodVersion,
    unit: record.unit,
    inputs: record.inputs,
    outputs: record.outputs,
    verdict: record.verdict ?? null,
    warnings: record.warnings,
    steps: record.steps,
    acceptance: record.acceptance ?? null,
    reference: record.reference,
    createdBy: view.creator,
    createdAt: record.createdAt.toISOString(),
  };
}

export function toImpactReport(report: ImpactReportRow, creator: PersonColumns | null): ImpactReport {
  return {
    id: report.id,
    pageId: report.pageId,
    fromRevisionId: report.fromRevisionId,
    toRevisionId: report.toRevisionId,
    changedBlocks: report.changedBlocks,
    recordsChecked: report.recordsChecked,
    affected: report.affected,
    createdBy: creator,
    createdAt: report.createdAt.toISOString(),
  };
}
