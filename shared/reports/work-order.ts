/**
 * The order of work, as data: steps keyed by the trade names of the zones involved, and
 * precedence pairs between steps (common practice of body framing: treat before repair, the
 * frame before the skins that hang on it, roof framing before the headliner fixed to it, the
 * headliner before the upholstery below it). Follow-on steps (refitting skins, headliner,
 * upholstery) appear only when a step present needs them.
 */
import { getZone, type BodyPlan, type TradeName } from '../body-plans';
import type { WorkStep } from './types';

export type WorkStepKey =
  | 'treat'
  | 'primary-frame'
  | 'side-rails'
  | 'roof-frame'
  | 'door-frames'
  | 'rear-frames'
  | 'floor'
  | 'seat-frames'
  | 'refit-skins'
  | 'refit-headliner'
  | 'refit-upholstery';

interface StepRule {
  key: WorkStepKey;
  title: string;
  why: string;
  /** Zones of these trades bring the step in. */
  trades: readonly TradeName[];
  /** Follow-on steps this one makes necessary. */
  needs: readonly WorkStepKey[];
}

export const WORK_STEP_RULES: readonly StepRule[] = [
  {
    key: 'treat',
    title: 'Treat active attack and let the wood dry',
    why: 'New wood and glue go only onto wood that is free of live attack and dry enough to hold them.',
    trades: [],
    needs: [],
  },
  {
    key: 'primary-frame',
    title: 'Repair the main frame: sills, pillars, heel board, cross members, wheel arches',
    why: 'Everything else is set out from these members, so they are made good and squared first.',
    trades: [
      'sill',
      'hinge-pillar',
      'lock-pillar',
      'rear-pillar',
      'windscreen-pillar',
      'heel-board',
      'cross-member',
      'wheel-arch',
      'dash-rail',
    ],
    needs: ['refit-skins'],
  },
  {
    key: 'side-rails',
    title: 'Repair the waist, belt and tonneau rails',
    why: 'The rails tie the pillars together and carry the top edge of the panels.',
    trades: ['waist-rail', 'belt-rail', 'tonneau-rail'],
    needs: ['refit-skins'],
  },
  {
    key: 'roof-frame',
    title: 'Repair the roof framing: roof (cant) rails, header rails, slats and bows',
    why: 'The roof frame sits on the pillars and must be true before the headliner goes back.',
    trades: ['roof-rail', 'header-rail', 'roof-slat', 'roof-bow'],
    needs: ['refit-skins', 'refit-headliner'],
  },
  {
    key: 'door-frames',
    title: 'Repair the door frames and re-hang the doors',
    why: 'Doors are fitted to the repaired openings, so they follow the frame.',
    trades: ['door-stile', 'door-rail'],
    needs: ['refit-skins', 'refit-upholstery'],
  },
  {
    key: 'rear-frames',
    title: 'Repair the tailgate and boot framing',
    why: 'They hang on the rear pillars and are fitted once those are right.',
    trades: ['tailgate-frame', 'boot-frame'],
    needs: ['refit-skins'],
  },
  {
    key: 'floor',
    title: 'Repair or renew the floor boards',
    why: 'Floor boards rest on the sills and cross members and are fitted after them.',
    trades: ['floor-board'],
    needs: ['refit-upholstery'],
  },
  {
    key: 'seat-frames',
    title: 'Repair the seat frames',
    why: 'Seat frames bolt to the floor and frame; their mountings must be sound.',
    trades: ['seat-frame'],
    needs: ['refit-upholstery'],
  },
  {
    key: 'refit-skins',
    title: 'Repair and refit the skin panels',
    why: 'Panels are fitted to the finished frame so they lie true and seal.',
    trades: ['skin-panel'],
    needs: [],
  },
  {
    key: 'refit-headliner',
    title: 'Refit the headliner',
    why: 'The headliner is tacked to the roof framing, so it goes back once that is done.',
    trades: [],
    needs: [],
  },
  {
    key: 'refit-upholstery',
    title: 'Refit the upholstery, door cards and trim',
    why: 'Trim goes in last so it is not damaged by the work above and around it.',
    trades: [],
    needs: [],
  },
];

const FRAME: WorkStepKey[] = [
  'primary-frame',
  'side-rails',
  'roof-frame',
  'door-frames',
  'rear-frames',
  'floor',
  'seat-frames',
];

/** [before, after]: treatment before repair, frame before skins, roof → headliner → upholstery. */
export const WORK_PRECEDENCE: readonly [WorkStepKey, WorkStepKey][] = [
  ...FRAME.map((k) => ['treat', k] as [WorkStepKey, WorkStepKey]),
  ['treat', 'refit-skins'],
  ...FRAME.map((k) => [k, 'refit-skins'] as [WorkStepKey, WorkStepKey]),
  ['primary-frame', 'side-rails'],
  ['primary-frame', 'roof-frame'],
  ['primary-frame', 'door-frames'],
  ['primary-frame', 'rear-frames'],
  ['primary-frame', 'floor'],
  ['floor', 'seat-frames'],
  ['roof-frame', 'refit-headliner'],
  ['refit-skins', 'refit-headliner'],
  ['refit-headliner', 'refit-upholstery'],
  ...FRAME.map((k) => [k, 'refit-upholstery'] as [WorkStepKey, WorkStepKey]),
  ['refit-skins', 'refit-upholstery'],
];

/** Kahn's algorithm over every rule, ties kept in rule order; throws on a cycle in the data. */
function linearOrder(): WorkStepKey[] {
  const keys = WORK_STEP_RULES.map((r) => r.key);
  const incoming = new Map(keys.map((k) => [k, 0]));
  for (const [, after] of WORK_PRECEDENCE) incoming.set(after, incoming.get(after)! + 1);
  const order: WorkStepKey[] = [];
  const ready = keys.filter((k) => incoming.get(k) === 0);
  while (ready.length) {
    const k = ready.shift()!;
    order.push(k);
    for (const [before, after] of WORK_PRECEDENCE) {
      if (before !== k) continue;
      incoming.set(after, incoming.get(after)! - 1);
      if (incoming.get(after) === 0) ready.push(after);
    }
    ready.sort((a, b) => keys.indexOf(a) - keys.indexOf(b));
  }
  if (order.length !== keys.length) throw new Error('Work-order precedence has a cycle');
  return order;
}

const ORDER = linearOrder();

export interface WorkItem {
  zoneKey: string;
  /** The zone has active attack to treat before repair. */
  needsTreatment?: boolean;
  /** The zone is listed for repair (false: only for treatment). Default true. */
  repair?: boolean;
}

/**
 * The steps the items call for, in an order that keeps every precedence pair. A filtered
 * topological order of the whole rule graph also keeps the pairs implied through steps absent here.
 */
export function orderOfWork(items: readonly WorkItem[], plan: BodyPlan): WorkStep[] {
  const zones = new Map<WorkStepKey, string[]>();
  const add = (key: WorkStepKey, label: string) => {
    const list = zones.get(key) ?? [];
    if (!list.includes(label)) list.push(label);
    zones.set(key, list);
  };
  for (const item of items) {
    const zone = getZone(plan, item.zoneKey);
    if (!zone) continue;
    if (item.needsTreatment) add('treat', zone.label);
    if (item.repair === false) continue;
    const rule = WORK_STEP_RULES.find((r) => r.trades.includes(zone.tradeName));
    if (!rule) continue;
    add(rule.key, zone.label);
    for (const next of rule.needs) add(next, zone.label);
  }
  return ORDER.filter((k) => zones.has(k)).map((k) => {
    const rule = WORK_STEP_RULES.find((r) => r.key === k)!;
    return { key: k, title: rule.title, why: rule.why, zoneLabels: zones.get(k)! };
  });
}
