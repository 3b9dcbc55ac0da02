/**
 * Residual section of a decayed rectangular member. Decayed wood is given no strength: its
 * strength cannot be judged from its look, and early brown rot cuts toughness sharply at a
 * few percent weight loss (Wood Handbook ch. 5); assessing the sound remainder is common
 * practice in timber condition assessment.
 */
import { requireNonNegative, requirePositive } from './errors';
import type { ResidualSection, ResidualSectionInput } from './types';

/** Rectangle b × h bending about the axis parallel to b: A = b·h, S = b·h²/6, I = b·h³/12. */
export function rectangleProperties(width: number, depth: number) {
  return {
    area: width * depth,
    sectionModulus: (width * depth * depth) / 6,
    momentOfInertia: (width * depth * depth * depth) / 12,
  };
}

/**
 * Sound section after decay measured in from each face: top/bottom reduce the depth,
 * left/right the width; a member decayed right through gives zeros, never negatives.
 */
export function residualSection(input: ResidualSectionInput): ResidualSection {
  const width = requirePositive('width', input.width);
  const depth = requirePositive('depth', input.depth);
  const face = (key: keyof ResidualSectionInput['decay']) =>
    requireNonNegative(`decay.${key}`, input.decay[key] ?? 0);
  const soundWidth = Math.max(0, width - face('left') - face('right'));
  const soundDepth = Math.max(0, depth - face('top') - face('bottom'));
  const whole = rectangleProperties(width, depth);
  const sound = rectangleProperties(soundWidth, soundDepth);
  return {
    width: soundWidth,
    depth: soundDepth,
    area: sound.area,
    sectionModulus: sound.sectionModulus,
    momentOfInertia: sound.momentOfInertia,
    areaRatio: sound.area / whole.area,
    sectionModulusRatio: sound.sectionModulus / whole.sectionModulus,
    momentOfInertiaRatio: sound.momentOfInertia / whole.momentOfInertia,
  };
}
