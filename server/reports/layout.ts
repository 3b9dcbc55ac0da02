/**
 * Page furniture and text helpers shared by both reports: the one place that knows the fonts,
 * margins, colours and how a block moves to the next page.
 */
import path from 'node:path';
import PDFDocument from 'pdfkit';
import type { PaperSize } from '@/shared/reports/types';
import { colors } from '@/shared/theme/colours';

export type Doc = PDFKit.PDFDocument;

const FONT_DIR = path.join(__dirname, '..', '..', 'assets', 'fonts');
export const FONT_FILES = {
  regular: path.join(FONT_DIR, 'AtkinsonHyperlegible_400Regular.ttf'),
  bold: path.join(FONT_DIR, 'AtkinsonHyperlegible_700Bold.ttf'),
};
export const REGULAR = 'Atkinson-Regular';
export const BOLD = 'Atkinson-Bold';

/** The app's palette, under the names the report code uses. */
export const INK = colors.ink;
export const MUTED = colors.inkMuted;
export const RULE = colors.line;
export const TIMBER_DARK = colors.timberDark;
export const SUNKEN = colors.surfaceSunken;

export const MARGIN = 54;
/** Kept clear at the foot of every page for the footer line. */
export const FOOTER_SPACE = 40;

export const SIZE = { body: 10, small: 8.5, h1: 17, h2: 13, h3: 10.5, title: 24 };

export interface DocInfo {
  title: string;
  author: string;
  subject: string;
  keywords: string;
  reportId: string;
}

/**
 * A document whose default font is the shipped face, so pdfkit never loads Helvetica (the
 * fonts in the file are exactly the app's); pages are buffered so footers can say "of M".
 */
export function createDoc(paperSize: PaperSize, info: DocInfo): Doc {
  const doc = new PDFDocument({
    size: paperSize === 'Letter' ? 'LETTER' : 'A4',
    margins: { top: MARGIN, left: MARGIN, right: MARGIN, bottom: MARGIN + FOOTER_SPACE - 16 },
    bufferPages: true,
    font: FONT_FILES.regular,
    info: {
      Title: info.title,
      Author: info.author,
      Subject: info.subject,
      Keywords: info.keywords,
      Creator: 'Soundframe',
      Producer: 'Soundframe',
    },
    lang: 'en',
    displayTitle: true,
  });
  // A custom Info key the verifier reads back from a dropped file.
  (doc.info as Record<string, unknown>).SoundframeReportId = info.reportId;
  doc.registerFont(REGULAR, FONT_FILES.regular);
  doc.registerFont(BOLD, FONT_FILES.bold);
  doc.font(REGULAR).fontSize(SIZE.body).fillColor(INK);
  return doc;
}

export const contentWidth = (doc: Doc) =>
  doc.page.width - doc.page.margins.left - doc.page.margins.right;
export const left = (doc: Doc) => doc.page.margins.left;
const bottomLimit = (doc: Doc) => doc.page.height - doc.page.margins.bottom;

/** Starts a new page unless `height` points still fit below the cursor. */
export function ensureSpace(doc: Doc, height: number) {
  if (doc.y + height > bottomLimit(doc)) doc.addPage();
}

export function heading(doc: Doc, text: string, level: 1 | 2 | 3 = 1) {
  const size = level === 1 ? SIZE.h1 : level === 2 ? SIZE.h2 : SIZE.h3;
  // A heading never sits alone at the foot of a page.
  ensureSpace(doc, size * 2 + 40);
  if (level === 1) doc.moveDown(0.6);
  else doc.moveDown(0.3);
  doc
    .font(BOLD)
    .fontSize(size)
    .fillColor(level === 1 ? TIMBER_DARK : INK);
  doc.text(text, left(doc), doc.y, { width: contentWidth(doc) });
  if (level === 1) {
    const y = doc.y + 2;
    doc
      .moveTo(left(doc), y)
      .lineTo(left(doc) + contentWidth(doc), y)
      .lineWidth(0.75)
      .strokeColor(RULE)
      .stroke();
    doc.y = y + 6;
  } else doc.moveDown(0.15);
  doc.font(REGULAR).fontSize(SIZE.body).fillColor(INK);
}

export function para(
  doc: Doc,
  text: string,
  opts: { bold?: boolean; size?: number; color?: string; indent?: number; gap?: number } = {},
) {
  const indent = opts.indent ?? 0;
  doc
    .font(opts.bold ? BOLD : REGULAR)
    .fontSize(opts.size ?? SIZE.body)
    .fillColor(opts.color ?? INK);
  ensureSpace(doc, doc.currentLineHeight(true) + 2);
  doc.text(text, left(doc) + indent, doc.y, { width: contentWidth(doc) - indent });
  if (opts.gap) doc.moveDown(opts.gap);
  doc.font(REGULAR).fontSize(SIZE.body).fillColor(INK);
}

export function bullets(doc: Doc, items: string[], indent = 0, size: number = SIZE.body) {
  for (const item of items) {
    doc.font(REGULAR).fontSize(size).fillColor(INK);
    ensureSpace(doc, doc.currentLineHeight(true) + 2);
    const x = left(doc) + indent;
    const y = doc.y;
    doc.text('•', x, y, { width: 10, lineBreak: false });
    doc.text(item, x + 12, y, { width: contentWidth(doc) - indent - 12 });
  }
  doc.fontSize(SIZE.body);
}

/** "Label: value" lines with the label in bold. */
export function fields(doc: Doc, rows: [string, string][], indent = 0) {
  for (const [label, value] of rows) {
    doc.fontSize(SIZE.body);
    ensureSpace(doc, doc.currentLineHeight(true) + 2);
    doc
      .font(BOLD)
      .fillColor(INK)
      .text(`${label}: `, left(doc) + indent, doc.y, {
        width: contentWidth(doc) - indent,
        continued: true,
      })
      .font(REGULAR)
      .text(value);
  }
}

/** What an empty section says, so a section never silently disappears. */
export function emptyNote(doc: Doc, text: string) {
  para(doc, text, { color: MUTED, gap: 0.3 });
}

export interface Column {
  header: string;
  width: number; // share of the content width
  align?: 'left' | 'right';
}

/** A simple ruled table; the header row repeats when the table runs onto a new page. */
export function table(
  doc: Doc,
  columns: Column[],
  rows: string[][],
  opts: { boldLast?: boolean } = {},
) {
  const total = contentWidth(doc);
  const widths = columns.map((c) => c.width * total);
  const pad = 3;
  const rowHeight = (cells: string[], font: string) => {
    doc.font(font).fontSize(SIZE.small);
    return (
      Math.max(...cells.map((c, i) => doc.heightOfString(c, { width: widths[i] - pad * 2 }))) +
      pad * 2
    );
  };
  const drawRow = (cells: string[], font: string, fill?: string) => {
    const h = rowHeight(cells, font);
    if (doc.y + h > bottomLimit(doc)) {
      doc.addPage();
      if (cells !== headerCells) drawRow(headerCells, BOLD, SUNKEN);
    }
    const y = doc.y;
    if (fill) doc.rect(left(doc), y, total, h).fillColor(fill).fill();
    let x = left(doc);
    doc.font(font).fontSize(SIZE.small).fillColor(INK);
    cells.forEach((c, i) => {
      doc.text(c, x + pad, y + pad, {
        width: widths[i] - pad * 2,
        align: columns[i].align ?? 'left',
      });
      x += widths[i];
    });
    doc
      .moveTo(left(doc), y + h)
      .lineTo(left(doc) + total, y + h)
      .lineWidth(0.5)
      .strokeColor(RULE)
      .stroke();
    doc.x = left(doc);
    doc.y = y + h;
  };
  const headerCells = columns.map((c) => c.header);
  ensureSpace(doc, rowHeight(headerCells, BOLD) * 2 + 4);
  drawRow(headerCells, BOLD, SUNKEN);
  rows.forEach((r, i) => drawRow(r, opts.boldLast && i === rows.length - 1 ? BOLD : REGULAR));
  doc.moveDown(0.5);
  doc.font(REGULAR).fontSize(SIZE.body);
}

/** "Page N of M" and the report's identifier on every page, drawn once all pages exist. */
export function footers(doc: Doc, text: string) {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottom = doc.page.margins.bottom;
    // Writing inside the bottom margin must not start a new page.
    doc.page.margins.bottom = 0;
    const y = doc.page.height - MARGIN + 10;
    const w = doc.page.width - MARGIN * 2;
    doc
      .moveTo(MARGIN, y - 6)
      .lineTo(MARGIN + w, y - 6)
      .lineWidth(0.5)
      .strokeColor(RULE)
      .stroke();
    doc.font(REGULAR).fontSize(SIZE.small).fillColor(MUTED);
    // Kept clear of the page number, cut short if a long vehicle name would reach it.
    doc.text(text, MARGIN, y, { width: w - 80, height: SIZE.small + 3, ellipsis: true });
    doc.text(`Page ${i + 1} of ${range.count}`, MARGIN, y, {
      width: w,
      align: 'right',
      lineBreak: false,
    });
    doc.page.margins.bottom = bottom;
  }
}
