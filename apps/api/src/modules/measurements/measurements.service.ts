import { Injectable } from '@nestjs/common';
import { importableTables, type LengthUnit, type TableImportResult } from '@limitbook/contracts';
import { findMethod } from '@limitbook/engine';
import { z } from 'zod';
import { MeasurementsException } from './measurements.exception.js';
import { readTableCsv, type TableShape } from './read-table-csv.js';

export interface UploadedCsv {
  originalname: string;
  buffer: Buffer;
}

@Injectable()
export class MeasurementsService {
  /** Reads an uploaded CSV into rows of `method`'s table input `input`, validated with the method's own item schema. */
  async importTable(method: string, input: string, file: UploadedCsv | undefined, unit: LengthUnit): Promise<TableImportResult> {
    const shape = tableShape(method, input);
    if (!file) throw MeasurementsException.of('no-file');
    return readTableCsv(file.buffer, shape, unit);
  }
}

function tableShape(methodId: string, input: string): TableShape {
  const columns = Object.hasOwn(importableTables, methodId) ? importableTables[methodId]![input] : undefined;
  const schema = findMethod(methodId)?.inputSchema;
  const list = schema instanceof z.ZodObject ? (schema.shape as Record<string, z.ZodType>)[input] : undefined;
  if (!columns || !Object.hasOwn(importableTables[methodId]!, input) || !(list instanceof z.ZodArray)) throw MeasurementsException.unknownTable(methodId, input);
  return { columns, item: list.element as z.ZodType, list, name: input };
}
