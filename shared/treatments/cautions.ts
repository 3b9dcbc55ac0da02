import type { TreatmentMethod } from '../schemas/treatment';

export interface TreatmentCaution {
  key: string;
  title: string;
  text: string;
  /** Where the caution comes from (/work/shared/SOURCES.md "Treatment and law"), or "common practice". */
  source: string;
  /** Methods it bears on most directly; shown first for them. Absent: every treatment. */
  methods?: readonly TreatmentMethod[];
}

/** Shown wherever a treatment is recorded. Our own wording; Soundframe never names a product, dose or rate. */
export const TREATMENT_CAUTIONS: readonly TreatmentCaution[] = [
  {
    key: 'label-is-law',
    title: 'The label is the law',
    text: 'Use a product only as its label says: where, how much, how often and by whom. Soundframe does not suggest a product, dose or rate; it records what the label you followed says.',
    source: 'FIFRA required label statement, 40 CFR 156.10 (US); elsewhere the local pesticide law',
  },
  {
    key: 'ppe-reentry',
    title: 'Protective equipment and re-entry from the label',
    text: 'Wear the protective equipment the label lists and keep people and animals out of the vehicle and the bay until the label’s re-entry time has passed and the space is ventilated.',
    source: 'Product label (FIFRA, 40 CFR 156.10 precautionary statements); local law elsewhere',
  },
  {
    key: 'foggers',
    title: 'Foggers do not reach insects in wood',
    text: 'A total-release fogger ("bug bomb") does not get into cracks or into the wood, so it does not treat boring insects or termites in a frame.',
    source: 'University of Kentucky Entomology, ENTFACT-643',
    methods: ['spray'],
  },
  {
    key: 'fumigation',
    title: 'Fumigation only by a licensed fumigator',
    text: 'Structural fumigation is a restricted-use application for certified fumigators only, and nobody re-enters before clearance testing shows the gas is gone. Drywood termites can live up to a week after a lethal dose, so an early check may still find them moving.',
    source:
      'US EPA (sulfuryl fluoride, restricted use, clearance testing); California Structural Pest Control Board, Fumigation brochure',
    methods: ['fumigation'],
  },
  {
    key: 'borates',
    title: 'Borates are for protected interior wood',
    text: 'Borate treatments dissolve in water and leach out of wood that gets wet: use them only on interior wood kept dry. On dry wood they may reach only the surface layer.',
    source: 'AWPA Use Category UC2; UC IPM 7418',
    methods: ['brush', 'spray', 'foam', 'injection'],
  },
  {
    key: 'licensing',
    title: 'Applying for hire may need a licence',
    text: 'Many places require anyone who applies pesticides for hire, or any restricted-use product, to hold a licence or certification. Check the rules where the work is done.',
    source: 'US EPA certified-applicator rules for restricted-use pesticides; local licensing law',
  },
  {
    key: 'dust',
    title: 'Dust from treated or mouldy wood',
    text: 'Cutting, sanding or brushing treated, decayed or mouldy wood raises dust that should not be breathed: contain it, extract it and wear the protection the label and local occupational-health rules call for.',
    source: 'Common practice; the product label and local occupational-health rules',
  },
];

/** Every caution, those bearing on `method` first (order otherwise kept). */
export function cautionsFor(method: TreatmentMethod | null | undefined): TreatmentCaution[] {
  const hits = (c: TreatmentCaution) => (method && c.methods?.includes(method) ? 0 : 1);
  return [...TREATMENT_CAUTIONS].sort((a, b) => hits(a) - hits(b));
}
