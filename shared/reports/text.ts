/**
 * Plain words for the reports: findings as sentences, the limits of a visual survey and the
 * cautions. Our own wording throughout; rules of thumb are marked common practice.
 */
import { INSECT_EVIDENCE_LABELS, SEVERITY_LABELS, type FindingResponse } from '../schemas/finding';
import { TREATMENT_CAUTIONS } from '../treatments/cautions';
import type { ReportCaution } from './types';

const DECAY_WORDS: Record<FindingResponse['decayType'], string | null> = {
  none: null,
  'brown-rot': 'brown rot',
  'white-rot': 'white rot',
  'soft-rot': 'soft rot',
  unknown: 'decay of a kind not identified',
};

const ACTIVITY_WORDS: Record<FindingResponse['activity'], string> = {
  active: 'active',
  inactive: 'no sign of current activity',
  unknown: 'activity not known',
};

/** 'Severity 3 (deep), brown rot, frass, fine powder, active'. */
export function findingWords(
  f: Pick<FindingResponse, 'severity' | 'decayType' | 'insectEvidence' | 'activity'>,
): string {
  const title = SEVERITY_LABELS[f.severity]?.title.toLowerCase() ?? 'not graded';
  const parts = [`Severity ${f.severity} (${title})`];
  const decay = DECAY_WORDS[f.decayType];
  if (decay) parts.push(decay);
  for (const e of f.insectEvidence) parts.push(INSECT_EVIDENCE_LABELS[e].toLowerCase());
  parts.push(ACTIVITY_WORDS[f.activity]);
  return parts.join(', ');
}

/** The limits of a visual, non-destructive survey (our own wording). */
export const SURVEY_LIMITATIONS: readonly string[] = [
  'This was a visual survey with simple hand tools (awl, pick test, pin moisture meter). Nothing was cut open, drilled or taken away for testing.',
  'Members hidden behind skin panels, trim, upholstery or later repairs were judged from what could be seen and reached; they were not opened up, and damage inside them may be worse than it looks.',
  'Moisture readings are spot readings at the points tested, on the day; wood between those points, or after a change of weather or storage, may read differently.',
  'Insects can be dormant for months: a zone with no fresh evidence on the day may still hold a live infestation, which is why treated zones are re-checked over a year.',
  'Verdicts and estimates come from measured sections and the workshop’s rules of thumb (common practice), not from strength tests of the actual wood.',
  'The report describes the body as found on the dates shown. It says nothing about changes after those dates.',
];

const pick = (key: string): ReportCaution => {
  const c = TREATMENT_CAUTIONS.find((t) => t.key === key);
  if (!c) throw new Error(`Unknown treatment caution ${key}`);
  return { key: c.key, title: c.title, text: c.text, source: c.source };
};

/** The cautions every report prints: pesticides, dust, structure, fumigation. */
export function reportCautions(): ReportCaution[] {
  return [
    pick('label-is-law'),
    pick('ppe-reentry'),
    pick('licensing'),
    pick('fumigation'),
    pick('dust'),
    {
      key: 'treated-wood-disposal',
      title: 'Offcuts of treated wood',
      text: 'Do not burn offcuts or shavings of treated wood; dispose of them as the local waste rules say.',
      source: 'Common practice; local waste rules',
    },
    {
      key: 'structure',
      title: 'The frame carries the body',
      text: 'A body frame that holds doors, hinges, seats and belt mountings is structural. The verdicts and costs here are estimates: have the work done or checked by a qualified restorer, and follow the local roadworthiness rules before the vehicle goes back on the road.',
      source: 'Common practice; local roadworthiness rules',
    },
  ];
}
