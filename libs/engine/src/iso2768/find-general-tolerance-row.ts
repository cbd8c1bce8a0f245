import { type GeneralToleranceRow, type GeneralToleranceTable } from './tables/general-tolerance-tables.js';

/** The row of an ISO 2768 table holding `lengthMm` ("over a up to and including b"); undefined outside it. */
export function findGeneralToleranceRow<TClass extends string>(
  table: GeneralToleranceTable<TClass>,
  lengthMm: number,
): GeneralToleranceRow<TClass> | undefined {
  return table.rows.find((row, index) => {
    const aboveLower = index === 0 && table.firstIncludesOver ? lengthMm >= row.over : lengthMm > row.over;
    return aboveLower && (row.upTo === null || lengthMm <= row.upTo);
  });
}

export function rowRangeText(row: GeneralToleranceRow<string>, firstIncludesOver: boolean, isFirst: boolean): string {
  const lower = isFirst && firstIncludesOver ? `${row.over}` : `over ${row.over}`;
  if (row.upTo === null) return `over ${row.over} mm`;
  return row.over === 0 ? `up to ${row.upTo} mm` : `${lower} up to ${row.upTo} mm`;
}
