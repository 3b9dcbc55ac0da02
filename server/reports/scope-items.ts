/** The item lists of the repair scope: structural and cosmetic members, monitor zones, undecided. */
import type { MonitorItem, RepairScope, ScopeItem } from '@/shared/reports/types';
import { STRUCTURAL_CLASS_LABELS } from '@/shared/body-plans';
import { SPECIES_LABELS } from '@/shared/species';
import { boardFeet, hours, longDate, money } from './format';
import {
  MUTED,
  SIZE,
  bullets,
  emptyNote,
  ensureSpace,
  fields,
  heading,
  para,
  type Doc,
} from './layout';

function speciesWords(item: ScopeItem): string {
  return item.species.length ? item.species.map((s) => SPECIES_LABELS[s] ?? s).join(', ') : 'none';
}

/** One member: zone, member, findings, verdict and reasons, hours, timber and cost. */
export function drawScopeItem(doc: Doc, item: ScopeItem, n: number, currency: string) {
  ensureSpace(doc, 120);
  doc.moveDown(0.3);
  para(doc, `${n}. ${item.zoneLabel}`, { bold: true, size: SIZE.h3 });
  fields(doc, [
    ['Zone', item.zoneLabel],
    [
      'Member',
      `${item.tradeLabel}, ${STRUCTURAL_CLASS_LABELS[item.structuralClass].toLowerCase()}${item.assembly ? `, part of ${item.assembly.replace(/-/g, ' ')}` : ''}`,
    ],
  ]);
  para(doc, 'Finding:', { bold: true });
  bullets(
    doc,
    item.findings.length ? item.findings : ['No open finding recorded on this zone.'],
    8,
  );
  fields(doc, [['Verdict', item.verdictLabel]]);
  if (item.reasons.length) {
    para(doc, 'Reasons:', { bold: true });
    bullets(doc, item.reasons, 8);
  }
  fields(doc, [
    ['Hours', hours(item.hours)],
    [
      'Timber',
      item.boardFeet > 0
        ? `${boardFeet(item.boardFeet)} (with waste), ${speciesWords(item)}`
        : 'none',
    ],
    [
      'Cost',
      `${money(item.totalCost, currency)} (labour ${money(item.labourCost, currency)}, timber and materials ${money(item.materialCost, currency)})`,
    ],
  ]);
}

function drawItems(doc: Doc, items: ScopeItem[], currency: string, empty: string) {
  if (!items.length) return emptyNote(doc, empty);
  items.forEach((item, i) => drawScopeItem(doc, item, i + 1, currency));
}

function recheckPlan(m: MonitorItem): string {
  const next = m.nextRechecks.length
    ? m.nextRechecks.map((r) => `${longDate(r.dueDate)}${r.overdue ? ' (overdue)' : ''}`).join('; ')
    : 'none planned';
  return `Next re-checks: ${next}. Clean re-checks so far: ${m.cleanRechecks} of ${m.cleanRechecksNeeded} needed to clear the zone.`;
}

export function drawMonitor(doc: Doc, scope: RepairScope) {
  heading(doc, 'Monitor');
  para(
    doc,
    'Zones under treatment or being watched, with the re-checks that decide whether they are clear.',
    {
      color: MUTED,
      gap: 0.2,
    },
  );
  if (!scope.monitor.length) return emptyNote(doc, 'No zones to monitor.');
  scope.monitor.forEach((m, i) => {
    ensureSpace(doc, 70);
    doc.moveDown(0.3);
    para(doc, `${i + 1}. ${m.zoneLabel}: ${m.stateLabel}${m.flagged ? ' (needs attention)' : ''}`, {
      bold: true,
      size: SIZE.h3,
    });
    if (m.reason) para(doc, m.reason);
    para(doc, recheckPlan(m));
    if (m.decision)
      fields(doc, [
        ['Verdict', m.decision.verdictLabel],
        ['Hours', hours(m.decision.hours)],
        [
          'Timber',
          m.decision.boardFeet > 0
            ? `${boardFeet(m.decision.boardFeet)} (with waste), ${speciesWords(m.decision)}`
            : 'none',
        ],
        ['Cost', money(m.decision.totalCost, scope.totals.currency)],
      ]);
  });
}

export function drawUndecided(doc: Doc, scope: RepairScope) {
  if (!scope.undecided.length) return;
  ensureSpace(doc, 60);
  doc.moveDown(0.4);
  para(doc, 'Awaiting a decision', { bold: true, size: SIZE.h2 });
  para(
    doc,
    'These zones have damage of severity 2 or worse but no member decision yet, so they are not costed above. They are listed so that nothing is left out silently.',
    { color: MUTED },
  );
  bullets(
    doc,
    scope.undecided.map(
      (u) => `${u.zoneLabel} (worst severity ${u.worstSeverity}): ${u.findings.join('; ')}`,
    ),
  );
}

export function drawStructuralAndCosmetic(doc: Doc, scope: RepairScope) {
  heading(doc, 'Structural, must fix');
  para(
    doc,
    'Members that carry the body and must be repaired or replaced before it is safe to use.',
    {
      color: MUTED,
      gap: 0.2,
    },
  );
  drawItems(doc, scope.structural, scope.totals.currency, 'No structural items.');
  heading(doc, 'Cosmetic');
  para(
    doc,
    'Work that improves appearance or durability but does not affect the strength of the frame.',
    {
      color: MUTED,
      gap: 0.2,
    },
  );
  drawItems(doc, scope.cosmetic, scope.totals.currency, 'No cosmetic items.');
}
