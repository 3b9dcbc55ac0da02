import type { WorkshopSettings } from '@/shared/schemas';
import { DECISION_CLASS_LABELS, VERDICT_OPTION_LABELS } from '@/shared/wood';
import type { DecayRiskLevel, DecisionClass, VerdictOption } from '@/shared/wood/types';
import type { BadgeTone } from '@/src/components/ui';

export type Units = WorkshopSettings['units'];

/** Decay-risk levels in words, with their step on a four-step scale (the non-colour cue). */
export const DECAY_RISK_LABELS: Record<
  DecayRiskLevel,
  { label: string; step: 1 | 2 | 3 | 4; tone: BadgeTone }
> = {
  dry: { label: 'Dry', step: 1, tone: 'ok' },
  elevated: { label: 'Elevated', step: 2, tone: 'caution' },
  'decay-possible': { label: 'Decay possible', step: 3, tone: 'danger' },
  saturated: { label: 'Saturated', step: 4, tone: 'danger' },
};

export const OPTION_LABELS: Record<VerdictOption, { label: string; description: string }> = {
  keep: {
    label: VERDICT_OPTION_LABELS.keep,
    description: 'Leave the member in place; clean, dry and protect it.',
  },
  consolidate: {
    label: VERDICT_OPTION_LABELS.consolidate,
    description: 'Harden the softened wood and fill it; the member stays.',
  },
  splice: {
    label: VERDICT_OPTION_LABELS.splice,
    description: 'Cut out the damaged length and scarf in a new piece.',
  },
  'replace-member': {
    label: VERDICT_OPTION_LABELS['replace-member'],
    description: 'Make a new member of the frame.',
  },
  'replace-assembly': {
    label: VERDICT_OPTION_LABELS['replace-assembly'],
    description: 'Rebuild the whole assembly it belongs to (a door frame, a roof frame).',
  },
};

export const CLASS_LABELS: Record<DecisionClass, { label: string; tone: BadgeTone }> = {
  'structural-must-fix': { label: DECISION_CLASS_LABELS['structural-must-fix'], tone: 'danger' },
  monitor: { label: DECISION_CLASS_LABELS.monitor, tone: 'caution' },
  cosmetic: { label: DECISION_CLASS_LABELS.cosmetic, tone: 'neutral' },
};

/** A money amount in the workshop's currency; an unknown code still shows the number. */
export function money(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat(undefined, { style: 'currency', currency }).format(amount);
  } catch {
    return `${currency} ${amount.toFixed(2)}`;
  }
}

/** 0.25 → "0.25 h", 4 → "4 h" (to the quarter hour a workshop sets, no trailing zeros). */
export function hours(h: number): string {
  return `${Math.round(h * 100) / 100} h`;
}
