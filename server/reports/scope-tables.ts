/** The repair scope's figures: totals, the timber cut list, the order of work, treatments. */
import type { RepairScope, TreatmentHistoryRow } from '@/shared/reports/types';
import { boardFeet, hours, longDate, money, section } from './format';
import {
  MUTED,
  SIZE,
  emptyNote,
  ensureSpace,
  fields,
  heading,
  para,
  table,
  type Doc,
} from './layout';

export function drawTotals(doc: Doc, scope: RepairScope) {
  const t = scope.totals;
  const m = (n: number) => money(n, t.currency);
  heading(doc, 'Totals');
  table(
    doc,
    [
      { header: 'Part of the scope', width: 0.4 },
      { header: 'Items', width: 0.15, align: 'right' },
      { header: 'Hours', width: 0.2, align: 'right' },
      { header: 'Cost', width: 0.25, align: 'right' },
    ],
    [
      [
        'Structural, must fix',
        String(t.structural.count),
        hours(t.structural.hours),
        m(t.structural.totalCost),
      ],
      ['Cosmetic', String(t.cosmetic.count), hours(t.cosmetic.hours), m(t.cosmetic.totalCost)],
      [
        'Monitor (members kept and watched)',
        String(t.monitor.count),
        hours(t.monitor.hours),
        m(t.monitor.totalCost),
      ],
      [
        'Whole scope',
        String(t.structural.count + t.cosmetic.count + t.monitor.count),
        hours(t.hours),
        m(t.totalCost),
      ],
    ],
    { boldLast: true },
  );
  fields(doc, [
    ['Total hours', hours(t.hours)],
    ['Total labour', m(t.labourCost)],
    ['Total timber and materials', m(t.materialCost)],
    ['Total cost', m(t.totalCost)],
  ]);
  doc.moveDown(0.4);
  para(doc, 'Timber by species (board feet with waste):', { bold: true });
  if (!t.boardFeetBySpecies.length) return emptyNote(doc, 'No timber is needed.');
  table(
    doc,
    [
      { header: 'Species', width: 0.5 },
      { header: 'Board feet', width: 0.25, align: 'right' },
      { header: 'Timber cost', width: 0.25, align: 'right' },
    ],
    t.boardFeetBySpecies.map((s) => [s.label, boardFeet(s.boardFeet), m(s.cost)]),
  );
}

export function drawCutList(doc: Doc, scope: RepairScope) {
  heading(doc, 'Timber cut list');
  if (!scope.cutList.length) return emptyNote(doc, 'No timber to cut.');
  para(
    doc,
    'Finished sizes are thickness × width × length; rough stock is in quarters of an inch (4/4 = 1 in).',
    {
      color: MUTED,
      size: SIZE.small,
      gap: 0.2,
    },
  );
  table(
    doc,
    [
      { header: 'Zone', width: 0.2 },
      { header: 'Species', width: 0.16 },
      { header: 'Finished size', width: 0.25 },
      { header: 'Rough', width: 0.07, align: 'right' },
      { header: 'Bd ft', width: 0.1, align: 'right' },
      { header: 'With waste', width: 0.1, align: 'right' },
      { header: 'Cost', width: 0.12, align: 'right' },
    ],
    scope.cutList.map((r) => [
      r.zoneLabel,
      r.speciesLabel,
      section(r.finishedThicknessMm, r.finishedWidthMm, r.finishedLengthMm, scope.units),
      `${r.roughQuarters}/4`,
      r.boardFeet.toFixed(2),
      r.boardFeetWithWaste.toFixed(2),
      money(r.cost, scope.totals.currency),
    ]),
  );
}

export function drawWorkOrder(doc: Doc, scope: RepairScope) {
  heading(doc, 'Order of work');
  if (!scope.workOrder.length) return emptyNote(doc, 'No work to order.');
  scope.workOrder.forEach((step, i) => {
    ensureSpace(doc, 50);
    para(doc, `Step ${i + 1}. ${step.title}`, { bold: true });
    para(doc, step.why, { color: MUTED, indent: 12 });
    para(doc, `Zones: ${step.zoneLabels.join(', ')}`, { indent: 12, gap: 0.3 });
  });
}

function treatmentBlock(doc: Doc, t: TreatmentHistoryRow, n: number) {
  ensureSpace(doc, 130);
  doc.moveDown(0.3);
  para(
    doc,
    `${n}. ${longDate(t.appliedAt)}: ${t.productName}${t.version > 1 ? ` (corrected, version ${t.version})` : ''}`,
    {
      bold: true,
      size: SIZE.h3,
    },
  );
  fields(doc, [
    ['Zones', t.zoneLabels.join(', ')],
    ['Against', t.target],
    ['Product', t.productName],
    ['Registration number', t.registrationNumber || 'not recorded'],
    ['Active ingredient', `${t.activeIngredient}, ${t.concentration}`],
    ['Method', t.method],
    ['Quantity', t.quantity],
    ['Protective equipment', t.ppe.length ? t.ppe.join(', ') : 'none recorded'],
    ['Re-entry interval', `${t.reentryHours} h`],
    ['Applied by', `${t.applicatorName}${t.licenceNumber ? `, licence ${t.licenceNumber}` : ''}`],
  ]);
}

export function drawTreatments(doc: Doc, scope: RepairScope) {
  heading(doc, 'Treatment history');
  if (!scope.treatments.length) return emptyNote(doc, 'No treatments recorded.');
  para(doc, 'As recorded from the product label at the time of application, oldest first.', {
    color: MUTED,
    gap: 0.2,
  });
  scope.treatments.forEach((t, i) => treatmentBlock(doc, t, i + 1));
}
