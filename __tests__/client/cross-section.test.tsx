import { render, screen } from '@testing-library/react-native';
import type { ReactTestInstance } from 'react-test-renderer';
import { residualSection } from '@/shared/wood';
import { CrossSection } from '@/src/components/wood/cross-section';
import { LengthBar } from '@/src/components/wood/length-bar';

/** What SVG text draws (react-native-svg renders it as TSpan `content`). */
function svgText(el: ReactTestInstance): string {
  return el
    .findAll((n) => (n.type as unknown) === 'RNSVGTSpan')
    .map((n) => n.props.content ?? '')
    .join(' ');
}

function draw(
  widthMm: number,
  depthMm: number,
  decay: { top: number; bottom: number; left: number; right: number },
  units: 'metric' | 'imperial' = 'metric',
) {
  const section = residualSection({ width: widthMm, depth: depthMm, decay });
  return render(
    <CrossSection
      widthMm={widthMm}
      depthMm={depthMm}
      decay={decay}
      section={section}
      units={units}
    />,
  );
}

const ratio = (id: string) => screen.getByTestId(id).props.children;

describe('CrossSection', () => {
  it('shows what is left of a 50 × 100 mm member with 25 mm decayed from the top', () => {
    draw(50, 100, { top: 25, bottom: 0, left: 0, right: 0 });
    // Sound 50 × 75: area 75/100; S ∝ b·h² → 0.75² = 56.25 %; I ∝ b·h³ → 0.75³ = 42.19 %.
    expect(ratio('ratio-area')).toBe('75 %');
    expect(ratio('ratio-modulus')).toBe('56 %');
    expect(ratio('ratio-stiffness')).toBe('42 %');
  });

  it('counts side decay against the width only: 10 mm off each side of 50 × 100 leaves 60 % of everything', () => {
    draw(50, 100, { top: 0, bottom: 0, left: 10, right: 10 });
    // Width 30 of 50; depth unchanged, so area, S and I all scale with the width.
    expect(ratio('ratio-area')).toBe('60 %');
    expect(ratio('ratio-modulus')).toBe('60 %');
    expect(ratio('ratio-stiffness')).toBe('60 %');
  });

  it('hatches only the faces that are decayed and outlines the sound core', () => {
    draw(45, 70, { top: 8, bottom: 0, left: 0, right: 5 });
    expect(screen.getByTestId('decay-band-top')).toBeTruthy();
    expect(screen.getByTestId('decay-band-right')).toBeTruthy();
    expect(screen.queryByTestId('decay-band-bottom')).toBeNull();
    expect(screen.queryByTestId('decay-band-left')).toBeNull();
    // The decayed bands are filled with the hatch pattern, not a flat colour.
    const fill = screen.getByTestId('decay-band-top').props.fill;
    expect(JSON.stringify(fill)).toMatch(/decay/);
    expect(screen.getByTestId('sound-core')).toBeTruthy();
  });

  it('draws a fully decayed member with no sound core and zero percentages', () => {
    draw(45, 70, { top: 40, bottom: 35, left: 0, right: 0 });
    expect(screen.queryByTestId('sound-core')).toBeNull();
    expect(ratio('ratio-area')).toBe('0 %');
    expect(ratio('ratio-modulus')).toBe('0 %');
    expect(ratio('ratio-stiffness')).toBe('0 %');
  });

  it('labels the dimensions in the workshop’s units', () => {
    draw(50.8, 76.2, { top: 0, bottom: 0, left: 0, right: 0 }, 'imperial');
    const labels = svgText(screen.getByTestId('cross-section'));
    expect(labels).toContain('width 2 in');
    expect(labels).toContain('depth 3 in');
  });
});

describe('LengthBar', () => {
  it('states the affected length against the member length', () => {
    render(
      <LengthBar
        affectedLengthMm={300}
        memberLengthMm={1200}
        spliceLimitRatio={0.35}
        units="metric"
      />,
    );
    expect(screen.getByTestId('length-bar-text')).toHaveTextContent(
      'Affected 300 mm of 1200 mm (25 % of the member)',
    );
  });
});
