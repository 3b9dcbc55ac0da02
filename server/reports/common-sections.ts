/** Sections both reports end with: what was not inspected, the limits, the cautions. */
import type { NotInspectedItem, ReportCaution } from '@/shared/reports/types';
import { longDate } from './format';
import { MUTED, SIZE, bullets, emptyNote, ensureSpace, heading, para, type Doc } from './layout';

export function drawNotInspected(
  doc: Doc,
  items: NotInspectedItem[],
  title = 'Not inspected',
  compact = false,
) {
  heading(doc, title, compact ? 2 : 1);
  if (!items.length) return emptyNote(doc, 'Every zone of the body plan was reached on a survey.');
  bullets(
    doc,
    items.map((i) => `${i.what} (survey of ${longDate(i.date)})`),
  );
}

export function drawLimitations(
  doc: Doc,
  limitations: string[],
  title = 'Limits of this survey',
  compact = false,
) {
  heading(doc, title, compact ? 2 : 1);
  if (!limitations.length) return emptyNote(doc, 'No limits recorded.');
  bullets(doc, limitations, 0, compact ? SIZE.small : SIZE.body);
}

export function drawCautions(
  doc: Doc,
  cautions: ReportCaution[],
  title = 'Cautions',
  compact = false,
) {
  heading(doc, title, compact ? 2 : 1);
  if (!cautions.length) return emptyNote(doc, 'No cautions apply.');
  if (compact) {
    bullets(
      doc,
      cautions.map((c) => `${c.title}. ${c.text} (${c.source})`),
      0,
      SIZE.small,
    );
    return;
  }
  for (const c of cautions) {
    ensureSpace(doc, 50);
    para(doc, c.title, { bold: true });
    para(doc, c.text);
    para(doc, `Source: ${c.source}`, { color: MUTED, size: SIZE.small, gap: 0.4 });
  }
}
