/**
 * Repair estimate for one member: hours at the workshop's rates, and for new wood a cut-list
 * line (species, rough thickness in quarters, board feet with waste, cost) and for a splice
 * its geometry. Hours are the workshop's figure per operation (settings.hoursPerOperation),
 * not scaled by length: the workshop sets them for its typical member, and a flat figure is
 * one it can check against its own time sheets.
 */
import { DomainError, requireNonNegative, requirePositive } from './errors';
import { boardFeet, roughThicknessQuarters, surfacedThicknessIn } from './lumber';
import { isSpeciesKey } from './moisture';
import type { WoodSettings } from './settings';
import { spliceGeometry } from './splice';
import {
  VERDICT_OPTIONS,
  type CutListLine,
  type RepairEstimate,
  type VerdictOption,
} from './types';
import { mmToIn } from './units';

/** Common practice: extra length on a replacement member, trimmed to fit. */
export const TRIM_ALLOWANCE_MM = 50;

export interface RepairEstimateInput {
  option: VerdictOption;
  widthMm: number;
  depthMm: number;
  memberLengthMm: number;
  affectedLengthMm: number;
  species: string;
  settings: WoodSettings;
  labourRatePerHour: number;
}

function round2(n: number): number {
  return Math.round(n * 100) / 100;
}

/**
 * One cut-list line. Stock thickness is the smaller of width and depth; board feet are on the
 * rough thickness in quarters × finished width × length (the waste factor covers edging and
 * defects).
 */
export function cutListLine(input: {
  species: string;
  widthMm: number;
  depthMm: number;
  lengthMm: number;
  wasteFactorPercent: number;
  pricePerBoardFoot: number;
}): CutListLine {
  const { species } = input;
  if (!isSpeciesKey(species)) throw new DomainError('species', `Unknown species "${species}".`);
  const thicknessMm = Math.min(
    requirePositive('widthMm', input.widthMm),
    requirePositive('depthMm', input.depthMm),
  );
  const widthMm = Math.max(input.widthMm, input.depthMm);
  const lengthMm = requirePositive('lengthMm', input.lengthMm);
  const waste = requireNonNegative('wasteFactorPercent', input.wasteFactorPercent);
  const price = requireNonNegative('pricePerBoardFoot', input.pricePerBoardFoot);
  const roughQuarters = quartersFor(
    thicknessMm,
    input.widthMm <= input.depthMm ? 'widthMm' : 'depthMm',
  );
  const bf = boardFeet(roughQuarters / 4, mmToIn(widthMm), mmToIn(lengthMm));
  // Cost from the rounded figure shown, so board feet × price is what the reader gets.
  const withWaste = round2(bf * (1 + waste / 100));
  return {
    species,
    finishedThicknessMm: thicknessMm,
    finishedWidthMm: widthMm,
    finishedLengthMm: lengthMm,
    roughQuarters,
    boardFeet: round2(bf),
    boardFeetWithWaste: withWaste,
    cost: round2(withWaste * price),
  };
}

/** Rough quarters for a thickness in mm, with any error naming the caller's field. */
function quartersFor(thicknessMm: number, field: string): number {
  try {
    return roughThicknessQuarters(mmToIn(thicknessMm));
  } catch (e) {
    if (e instanceof DomainError) throw new DomainError(field, e.message);
    throw e;
  }
}

export function estimateRepair(input: RepairEstimateInput): RepairEstimate {
  const { option, settings, species } = input;
  if (!VERDICT_OPTIONS.includes(option))
    throw new DomainError('option', `Unknown repair option "${option}".`);
  if (!isSpeciesKey(species)) throw new DomainError('species', `Unknown species "${species}".`);
  requirePositive('widthMm', input.widthMm);
  requirePositive('depthMm', input.depthMm);
  const memberLengthMm = requirePositive('memberLengthMm', input.memberLengthMm);
  const affectedLengthMm = requireNonNegative('affectedLengthMm', input.affectedLengthMm);
  const rate = requireNonNegative('labourRatePerHour', input.labourRatePerHour);
  const hours = requireNonNegative(
    `settings.hoursPerOperation.${option}`,
    settings.hoursPerOperation[option],
  );
  const notes = [`${hours} h is the workshop’s figure for this operation (settings).`];

  let lengthMm: number | null = null;
  let splice: RepairEstimate['splice'] = null;
  if (option === 'splice') {
    splice = spliceGeometry(input.depthMm, settings.scarfSlope);
    lengthMm = Math.max(affectedLengthMm, 1) + 2 * splice.scarfLengthMm;
    notes.push(
      `New wood: the affected ${Math.round(affectedLengthMm)} mm plus a ${Math.round(splice.scarfLengthMm)} mm scarf at each end (1:${settings.scarfSlope}).`,
      `Keep splices at least ${Math.round(splice.minSpacingMm)} mm apart, three times the longer splice (FAA AC 43.13-1B §1-40; aircraft practice, a conservative default here).`,
    );
    if (lengthMm > memberLengthMm) {
      notes.push(
        'The splice with its scarfs is longer than the member: replacing the member is simpler.',
      );
    }
  } else if (option === 'replace-member' || option === 'replace-assembly') {
    lengthMm = memberLengthMm + TRIM_ALLOWANCE_MM;
    notes.push(
      `New wood: the member length plus ${TRIM_ALLOWANCE_MM} mm to trim to fit (common practice).`,
    );
    if (option === 'replace-assembly') {
      notes.push(
        'Only this member’s timber is listed; the assembly’s other members have their own decisions.',
      );
    }
  }

  const cutList =
    lengthMm === null
      ? []
      : [
          cutListLine({
            species,
            widthMm: input.widthMm,
            depthMm: input.depthMm,
            lengthMm,
            wasteFactorPercent: settings.wasteFactorPercent,
            pricePerBoardFoot: requireNonNegative(
              `settings.timberPricePerBoardFoot.${species}`,
              settings.timberPricePerBoardFoot[species],
            ),
          }),
        ];
  for (const line of cutList) {
    notes.push(
      `${line.roughQuarters}/4 rough stock (${surfacedThicknessIn(line.roughQuarters)} in surfaced) covers the ${Math.round(line.finishedThicknessMm)} mm finished thickness; ${settings.wasteFactorPercent} % added for waste.`,
    );
  }
  const labourCost = round2(hours * rate);
  const materialCost = round2(cutList.reduce((sum, l) => sum + l.cost, 0));
  return {
    hours,
    labourCost,
    materialCost,
    totalCost: round2(labourCost + materialCost),
    cutList,
    splice,
    notes,
  };
}
