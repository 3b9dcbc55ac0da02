import { SPECIES_KEYS, type SpeciesKey } from '@/shared/body-plans';
import { workshopSettings, type WorkshopSettings } from '@/shared/schemas';
import { DEFAULT_WOOD_SETTINGS, VERDICT_OPTIONS, type VerdictOption } from '@/shared/wood';
import { DEFAULT_TREATMENT_SETTINGS, PLAN_GROUPS, type PlanGroup } from '@/shared/treatments';
import { parseNumber } from '@/src/components/findings/form-values';

/** What the settings form edits: numbers stay text, shares of a member are whole percent. */
export type SettingsFormValues = {
  units: WorkshopSettings['units'];
  paperSize: WorkshopSettings['paperSize'];
  region: string;
  currency: string;
  labourRatePerHour: string;
  keepPercent: string;
  consolidatePercent: string;
  splicePercent: string;
  jointRulesOutConsolidation: boolean;
  replaceAssemblyMinMembers: string;
  scarfSlope: string;
  hours: Record<VerdictOption, string>;
  prices: Record<SpeciesKey, string>;
  wastePercent: string;
  regulatoryNotes: string;
  cleanChecksRequired: string;
  minSpanDays: string;
  /** Days after the treatment, as the owner types them: "14, 42, 90". */
  plans: Record<PlanGroup, string>;
  timeZone: string;
};

/** Error messages keyed by request path ("settings.wood.scarfSlope"). */
export type SettingsErrors = Record<string, string>;

const RULES = 'settings.wood.verdictRules';
export const PLANS = 'settings.treatments.recheckPlans';
/** Request path of each ratio shown as a percent. */
const RATIO_PATHS = {
  keepPercent: `${RULES}.keepMinSectionModulusRatio`,
  consolidatePercent: `${RULES}.consolidateMinSectionModulusRatio`,
  splicePercent: `${RULES}.spliceMaxAffectedLengthRatio`,
} as const;

const pct = (ratio: number) => String(Math.round(ratio * 1000) / 10);
const mapValues = <K extends string, A, B>(o: Record<K, A>, f: (a: A) => B) =>
  Object.fromEntries(Object.entries(o).map(([k, v]) => [k, f(v as A)])) as Record<K, B>;

export function valuesFromSettings(s: WorkshopSettings): SettingsFormValues {
  const r = s.wood.verdictRules;
  return {
    units: s.units,
    paperSize: s.paperSize,
    region: s.region,
    currency: s.currency,
    labourRatePerHour: String(s.labourRatePerHour),
    keepPercent: pct(r.keepMinSectionModulusRatio),
    consolidatePercent: pct(r.consolidateMinSectionModulusRatio),
    splicePercent: pct(r.spliceMaxAffectedLengthRatio),
    jointRulesOutConsolidation: r.jointDamageRulesOutConsolidation,
    replaceAssemblyMinMembers: String(r.replaceAssemblyMinMembers),
    scarfSlope: String(s.wood.scarfSlope),
    hours: mapValues(s.wood.hoursPerOperation, String),
    prices: mapValues(s.wood.timberPricePerBoardFoot, String),
    wastePercent: String(s.wood.wasteFactorPercent),
    regulatoryNotes: s.treatments.regulatoryNotes,
    cleanChecksRequired: String(s.treatments.clearance.cleanChecksRequired),
    minSpanDays: String(s.treatments.clearance.minSpanDays),
    plans: mapValues(s.treatments.recheckPlans, (days) => days.join(', ')),
    timeZone: s.treatments.timeZone,
  };
}

/** The message beside a plan: a server or schema issue may point at one day in its list. */
export function planError(errors: SettingsErrors, group: PlanGroup): string | undefined {
  const path = `${PLANS}.${group}`;
  const key = Object.keys(errors).find((k) => k === path || k.startsWith(`${path}.`));
  return key ? errors[key] : undefined;
}

/** The form with every wood setting put back to the common practice defaults (the rest kept). */
export function withWoodDefaults(values: SettingsFormValues): SettingsFormValues {
  const defaults = valuesFromSettings({
    units: values.units,
    paperSize: values.paperSize,
    region: values.region,
    currency: values.currency,
    labourRatePerHour: 0,
    wood: DEFAULT_WOOD_SETTINGS,
    treatments: DEFAULT_TREATMENT_SETTINGS,
  });
  const { labourRatePerHour, regulatoryNotes, cleanChecksRequired, minSpanDays, plans, timeZone } =
    values;
  return {
    ...defaults,
    labourRatePerHour,
    regulatoryNotes,
    cleanChecksRequired,
    minSpanDays,
    plans,
    timeZone,
  };
}

/** The PATCH body's settings (the whole of them), or the message for each field that is off. */
export function buildSettings(values: SettingsFormValues): {
  settings: WorkshopSettings | null;
  errors: SettingsErrors;
} {
  const errors: SettingsErrors = {};
  const num = (path: string, text: string): number => {
    const n = parseNumber(text);
    if (n === null) errors[path] = 'Enter a number';
    else if (Number.isNaN(n)) errors[path] = 'Enter a number, e.g. 12 or 12.5';
    return n ?? NaN;
  };
  const ratio = (key: keyof typeof RATIO_PATHS) => {
    const n = num(RATIO_PATHS[key], values[key]);
    if (!Number.isNaN(n) && (n < 0 || n > 100)) errors[RATIO_PATHS[key]] = 'Between 0 and 100 %';
    return n / 100;
  };
  const days = (group: PlanGroup): number[] => {
    const parts = values.plans[group].split(',').map((p) => p.trim());
    if (parts.every((p) => /^\d+$/.test(p))) return parts.map(Number);
    errors[`${PLANS}.${group}`] = 'Whole days after the treatment, separated by commas';
    return [];
  };
  const candidate = {
    units: values.units,
    paperSize: values.paperSize,
    region: values.region,
    currency: values.currency,
    labourRatePerHour: num('settings.labourRatePerHour', values.labourRatePerHour),
    wood: {
      verdictRules: {
        keepMinSectionModulusRatio: ratio('keepPercent'),
        consolidateMinSectionModulusRatio: ratio('consolidatePercent'),
        spliceMaxAffectedLengthRatio: ratio('splicePercent'),
        jointDamageRulesOutConsolidation: values.jointRulesOutConsolidation,
        replaceAssemblyMinMembers: num(
          `${RULES}.replaceAssemblyMinMembers`,
          values.replaceAssemblyMinMembers,
        ),
      },
      scarfSlope: num('settings.wood.scarfSlope', values.scarfSlope),
      hoursPerOperation: Object.fromEntries(
        VERDICT_OPTIONS.map((o) => [
          o,
          num(`settings.wood.hoursPerOperation.${o}`, values.hours[o]),
        ]),
      ),
      timberPricePerBoardFoot: Object.fromEntries(
        SPECIES_KEYS.map((k) => [
          k,
          num(`settings.wood.timberPricePerBoardFoot.${k}`, values.prices[k]),
        ]),
      ),
      wasteFactorPercent: num('settings.wood.wasteFactorPercent', values.wastePercent),
    },
    treatments: {
      recheckPlans: Object.fromEntries(PLAN_GROUPS.map((g) => [g, days(g)])),
      clearance: {
        cleanChecksRequired: num(
          'settings.treatments.clearance.cleanChecksRequired',
          values.cleanChecksRequired,
        ),
        minSpanDays: num('settings.treatments.clearance.minSpanDays', values.minSpanDays),
      },
      timeZone: values.timeZone.trim(),
      regulatoryNotes: values.regulatoryNotes,
    },
  };
  const parsed = workshopSettings.safeParse(candidate);
  if (!parsed.success)
    for (const issue of parsed.error.issues) {
      // A plan's issue may name one day of it; its message goes beside the whole list.
      const at = issue.path.map(String);
      const path = ['settings', ...(at[1] === 'recheckPlans' ? at.slice(0, 3) : at)].join('.');
      errors[path] ??= friendly(issue);
    }
  if (!parsed.success || Object.keys(errors).length) return { settings: null, errors };
  return { settings: parsed.data, errors: {} };
}

function friendly(issue: {
  code: string;
  message: string;
  origin?: string;
  minimum?: unknown;
  maximum?: unknown;
}) {
  if (issue.origin === 'string')
    return issue.code === 'too_small' ? 'Required' : `At most ${issue.maximum} characters`;
  if (issue.code === 'too_big' && typeof issue.maximum === 'number')
    return `At most ${issue.maximum}`;
  if (issue.code === 'too_small' && typeof issue.minimum === 'number')
    return `At least ${issue.minimum}`;
  if (issue.code === 'invalid_type' || issue.origin === 'int') return 'A whole number';
  return issue.message;
}
