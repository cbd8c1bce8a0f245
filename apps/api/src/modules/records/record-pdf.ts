import { type CalculationRecord } from '@limitbook/contracts';
import PDFDocument from 'pdfkit';
import SVGtoPDF from 'svg-to-pdfkit';
import { latexToSvg } from './latex-svg.js';

type Doc = InstanceType<typeof PDFDocument>;

const margin = 50;
const ink = '#1d2a33';
const muted = '#5b6770';
const accent = '#1f5c4a';
const pass = '#1f6b3a';
const fail = '#a12a2a';
/** MathJax sizes in ems (viewBox units are 1/1000 em); this is the em in points. */
const mathEm = 11;
const maxRowsPerTable = 200;

/** `feature.lowerLimit = 19.9` rows from nested inputs or outputs; long lists are summarised. */
function flatten(value: unknown, prefix = ''): [string, string][] {
  if (Array.isArray(value)) {
    if (value.length > 20 || value.some((item) => item !== null && typeof item === 'object' && !Array.isArray(item) && Object.keys(item).length > 6)) {
      return [[prefix, `(${value.length} values)`]];
    }
    return value.flatMap((item, index) => flatten(item, prefix ? `${prefix}.${index}` : String(index)));
  }
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value);
    if (entries.length === 0) return [[prefix, '—']];
    return entries.flatMap(([key, item]) => flatten(item, prefix ? `${prefix}.${key}` : key));
  }
  return [[prefix, value === null || value === undefined ? '—' : String(value)]];
}

function ensureRoom(doc: Doc, height: number): void {
  if (doc.y + height > doc.page.height - margin) doc.addPage();
}

function heading(doc: Doc, text: string): void {
  ensureRoom(doc, 40);
  doc.moveDown(0.8).font('Helvetica-Bold').fontSize(12).fillColor(accent).text(text, margin).moveDown(0.3).fillColor(ink);
}

function table(doc: Doc, rows: [string, string][], unit: string): void {
  const width = doc.page.width - 2 * margin;
  const keyWidth = width * 0.45;
  const shown = rows.slice(0, maxRowsPerTable);
  doc.font('Helvetica').fontSize(9.5);
  for (const [key, value] of shown) {
    const height = Math.max(doc.heightOfString(key, { width: keyWidth - 8 }), doc.heightOfString(value, { width: width - keyWidth })) + 4;
    ensureRoom(doc, height);
    const y = doc.y;
    doc.fillColor(muted).text(key, margin, y, { width: keyWidth - 8 });
    doc.fillColor(ink).text(value, margin + keyWidth, y, { width: width - keyWidth });
    doc.y = y + height;
    doc.moveTo(margin, doc.y - 2).lineTo(margin + width, doc.y - 2).lineWidth(0.3).strokeColor('#d5dbe0').stroke();
  }
  if (rows.length > shown.length) doc.fillColor(muted).text(`… and ${rows.length - shown.length} more rows`, margin);
  doc.fillColor(muted).fontSize(8.5).text(`Lengths in ${unit}.`, margin).fillColor(ink);
}

/** A step's formula as vector math; TeX that MathJax refuses is shown as its source instead. */
function formula(doc: Doc, latex: string): 'svg' | 'text' {
  const width = doc.page.width - 2 * margin - 20;
  try {
    const svg = latexToSvg(latex);
    const viewBox = /viewBox="([-\d.]+) ([-\d.]+) ([\d.]+) ([\d.]+)"/.exec(svg);
    if (!viewBox) throw new Error('No viewBox in the rendered formula');
    let w = (Number(viewBox[3]) / 1000) * mathEm;
    let h = (Number(viewBox[4]) / 1000) * mathEm;
    if (w > width) {
      h *= width / w;
      w = width;
    }
    ensureRoom(doc, h + 6);
    const y = doc.y + 2;
    // MathJax paints with currentColor, which svg-to-pdfkit resolves through the callback.
    SVGtoPDF(doc as never, svg, margin + 20, y, { width: w, height: h, assumePt: true, colorCallback: (color) => color ?? [[29, 42, 51], 1] });
    doc.y = y + h + 4;
    doc.x = margin;
    return 'svg';
  } catch {
    doc.font('Courier').fontSize(9).fillColor(ink).text(latex, margin + 20, doc.y, { width });
    doc.font('Helvetica');
    return 'text';
  }
}

/**
 * One record as a PDF: header (record, page, revision, method, who, when, reference), inputs,
 * outputs, verdict with its checks, warnings and the derivation with each formula rendered.
 * Helvetica is one of the PDF base fonts, so nothing needs embedding.
 */
export function renderRecordPdf(record: CalculationRecord, options: { compress?: boolean } = {}): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'A4',
    margin,
    compress: options.compress ?? true,
    info: { Title: `Limitbook record ${record.id}`, Author: record.createdBy?.name ?? 'Limitbook', Subject: `${record.page.documentNumber} ${record.page.title}` },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  doc.font('Helvetica-Bold').fontSize(18).fillColor(accent).text('Limitbook');
  doc.font('Helvetica').fontSize(10).fillColor(muted).text(`Calculation record ${record.id}`).moveDown(0.6);
  doc.font('Helvetica-Bold').fontSize(14).fillColor(ink).text(`${record.page.documentNumber} ${record.page.title}`);
  const reference = [
    record.reference.partNumber ? `Part number: ${record.reference.partNumber}` : null,
    record.reference.drawing ? `Drawing: ${record.reference.drawing}` : null,
    record.reference.note ? `Note: ${record.reference.note}` : null,
  ].filter((line): line is string => line !== null);
  const header: [string, string][] = [
    ['Page revision', record.revision.revisionLetter ? `Rev. ${record.revision.revisionLetter} (${record.revision.state})` : `${record.revision.sequence} (${record.revision.state})`],
    ['Calculator block', record.blockId],
    ['Method', `${record.method}, version ${record.methodVersion}`],
    ['Recorded by', record.createdBy ? `${record.createdBy.name} <${record.createdBy.email}>` : 'a former user'],
    ['Recorded at', `${record.createdAt.replace('T', ' ').replace(/\.\d+Z$/, ' UTC').replace(/Z$/, ' UTC')}`],
    ['Reference', reference.length > 0 ? reference.join('\n') : '—'],
  ];
  doc.moveDown(0.4);
  table(doc, header, record.unit);

  heading(doc, 'Inputs');
  table(doc, flatten(record.inputs), record.unit);
  heading(doc, 'Outputs');
  table(doc, flatten(record.outputs), record.unit);

  heading(doc, 'Verdict');
  if (!record.verdict) {
    doc.font('Helvetica').fontSize(10).text('No verdict: the block has no acceptance rule and the method judged nothing.');
  } else {
    doc.font('Helvetica-Bold').fontSize(11).fillColor(record.verdict.pass ? pass : fail).text(`${record.verdict.pass ? 'PASS' : 'FAIL'}: ${record.verdict.summary}`);
    doc.font('Helvetica').fontSize(9.5);
    for (const check of record.verdict.checks) {
      ensureRoom(doc, 24);
      doc.fillColor(check.pass ? pass : fail).text(`${check.pass ? 'Pass' : 'Fail'}  `, margin + 10, doc.y, { continued: true }).fillColor(ink).text(`${check.label} (${check.detail})`);
    }
  }
  if (record.acceptance) doc.fillColor(muted).fontSize(9).text(`Acceptance rule of the block: ${record.acceptance.output} ${record.acceptance.operator} ${record.acceptance.value}${record.acceptance.value2 !== undefined ? ` and ${record.acceptance.value2}` : ''}${record.acceptance.unit ? ` ${record.acceptance.unit}` : ''}`, margin);

  if (record.warnings.length > 0) {
    heading(doc, 'Warnings');
    doc.font('Helvetica').fontSize(9.5).fillColor(ink);
    for (const warning of record.warnings) doc.text(`• ${warning}`, margin + 10);
  }

  heading(doc, 'Derivation');
  record.steps.forEach((step, index) => {
    ensureRoom(doc, 40);
    doc.font('Helvetica-Bold').fontSize(10).fillColor(ink).text(`${index + 1}. ${step.label}`, margin);
    formula(doc, step.latex);
    doc.font('Helvetica').fontSize(9.5).fillColor(muted).text(`= ${step.value}`, margin + 20).fillColor(ink).moveDown(0.3);
  });

  doc.end();
  return done;
}
