/** The first page's top half: what the report is about, who made it and the condition in brief. */
import type { ConditionSummary, ReportCover } from '@/shared/reports/types';
import type { RenderIdentity } from './types';
import { longDate, percent } from './format';
import {
  BOLD,
  INK,
  MUTED,
  REGULAR,
  RULE,
  SIZE,
  SUNKEN,
  TIMBER_DARK,
  contentWidth,
  fields,
  left,
  type Doc,
} from './layout';

export function drawCover(
  doc: Doc,
  cover: ReportCover,
  identity: RenderIdentity,
  kindLabel: string,
) {
  const x = left(doc);
  const w = contentWidth(doc);
  doc.font(BOLD).fontSize(SIZE.small).fillColor(MUTED);
  doc.text(`${cover.workshopName.toUpperCase()}  ·  ${kindLabel.toUpperCase()}`, x, doc.y, {
    width: w,
  });
  doc.moveDown(0.4);
  doc
    .font(BOLD)
    .fontSize(SIZE.title)
    .fillColor(TIMBER_DARK)
    .text(cover.vehicleTitle, x, doc.y, { width: w });
  doc.font(REGULAR).fontSize(SIZE.h3).fillColor(INK).text(cover.title, { width: w });
  doc.moveDown(0.6);
  fields(doc, [
    ['Chassis number', cover.chassisNumber || 'not recorded'],
    ['Body number', cover.bodyNumber || 'not recorded'],
    ['Body style', cover.bodyPlanName],
    ['Owner', cover.clientName || 'not recorded'],
    ['Workshop', cover.workshopName],
    ['Inspected by', cover.inspectorName ?? 'no survey recorded'],
    ['Latest survey', longDate(cover.latestSurveyDate)],
    [
      'Report',
      `${identity.shortId}, version ${identity.version}, made ${longDate(cover.generatedAt)} by ${cover.generatedByName || cover.workshopName}`,
    ],
  ]);
  doc.moveDown(0.3);
  doc
    .font(REGULAR)
    .fontSize(SIZE.small)
    .fillColor(MUTED)
    .text(
      `To check that this copy is genuine and unchanged, enter ${identity.shortId} or drop this PDF on ${
        identity.verifyUrl ?? 'the Soundframe verification page of the workshop that issued it'
      }.`,
      x,
      doc.y,
      { width: w, link: identity.verifyUrl ?? undefined },
    );
  doc.moveDown(0.6);
}

/** The condition grade in a shaded box: label, rank on our five-step scale, meaning, counts. */
/**
 * `body` replaces the counts under the grade text: the buyer's report gives plain sentences
 * instead of the trade's counts by class (which would say the same twice).
 */
export function drawConditionBox(
  doc: Doc,
  c: ConditionSummary,
  opts: { extra?: string[]; body?: string[] } = {},
) {
  const x = left(doc);
  const w = contentWidth(doc);
  const pad = 10;
  const lines = [
    c.gradeText,
    ...(opts.body ?? [
      `Primary members sound: ${c.primarySound} of ${c.primaryMembers} (${percent(c.primarySoundShare)}).`,
      `Structural, must fix: ${c.countsByClass['structural-must-fix']}; cosmetic: ${c.countsByClass.cosmetic}; monitor: ${c.countsByClass.monitor}` +
        (c.undecidedZones ? `; zones awaiting a decision: ${c.undecidedZones}.` : '.'),
      `Zones with active attack: ${c.activeZones}; zones under treatment or watched: ${c.watchedZones}.`,
    ]),
    ...(opts.extra ?? []),
  ];
  doc.font(REGULAR).fontSize(SIZE.body);
  const textH = lines.reduce((h, l) => h + doc.heightOfString(l, { width: w - pad * 2 }) + 2, 0);
  const titleH = 22;
  const h = titleH + textH + pad * 2;
  if (doc.y + h > doc.page.height - doc.page.margins.bottom) doc.addPage();
  const y = doc.y;
  doc.rect(x, y, w, h).fillColor(SUNKEN).fill();
  doc.rect(x, y, 4, h).fillColor(TIMBER_DARK).fill();
  doc
    .font(BOLD)
    .fontSize(SIZE.h2)
    .fillColor(INK)
    .text(
      `Overall condition: ${c.gradeLabel} (grade ${c.gradeRank} of 5, 1 is best)`,
      x + pad + 4,
      y + pad,
      {
        width: w - pad * 2 - 4,
      },
    );
  doc.y = y + pad + titleH;
  doc.font(REGULAR).fontSize(SIZE.body).fillColor(INK);
  for (const l of lines) {
    doc.text(l, x + pad + 4, doc.y, { width: w - pad * 2 - 4 });
    doc.moveDown(0.15);
  }
  doc.y = y + h + 8;
  doc.x = x;
  doc.strokeColor(RULE);
}
