import { useId } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Defs, G, Line, Pattern, Rect, Text as SvgText } from 'react-native-svg';
import { formatLength, percent } from '@/shared/wood';
import type { DecayFaces, ResidualSection } from '@/shared/wood/types';
import { svgIdPrefix } from '@/src/components/body-diagram/hatch';
import { AppText } from '@/src/components/ui';
import { colors, fonts, radius, spacing } from '@/src/theme';
import type { Units } from './labels';

type Props = {
  widthMm: number;
  depthMm: number;
  decay: Required<DecayFaces>;
  section: ResidualSection;
  units: Units;
};

const VIEW_W = 300;
/** Tallest the member itself is drawn; the drawing's height follows the member's shape. */
const MAX_BOX_H = 180;
const PAD = { left: 56, right: 16, top: 28, bottom: 40 };
const FACES = ['top', 'bottom', 'left', 'right'] as const;

/**
 * The member's cross-section to scale: decayed wood measured in from each face is shaded and
 * hatched (it counts for nothing), the sound core is what carries load. Bending is about the
 * axis parallel to the width, drawn dashed through the sound core.
 */
export function CrossSection({ widthMm, depthMm, decay, section, units }: Props) {
  const id = svgIdPrefix(useId());
  const boxW = VIEW_W - PAD.left - PAD.right;
  const s = Math.min(boxW / widthMm, MAX_BOX_H / depthMm);
  const w = widthMm * s;
  const h = depthMm * s;
  // Room for the rotated depth label beside a shallow member.
  const viewH = Math.max(h, 90) + PAD.top + PAD.bottom;
  const x0 = PAD.left + (boxW - w) / 2;
  const y0 = PAD.top + (viewH - PAD.top - PAD.bottom - h) / 2;
  const top = Math.min(decay.top, depthMm) * s;
  const bottom = Math.min(decay.bottom, depthMm) * s;
  const left = Math.min(decay.left, widthMm) * s;
  const right = Math.min(decay.right, widthMm) * s;
  const coreW = section.width * s;
  const coreH = section.depth * s;
  const hatch = `url(#${id}-decay)`;
  const bands = {
    top: { x: x0, y: y0, width: w, height: top },
    bottom: { x: x0, y: y0 + h - bottom, width: w, height: bottom },
    left: { x: x0, y: y0, width: left, height: h },
    right: { x: x0 + w - right, y: y0, width: right, height: h },
  };
  const label = `Cross-section ${formatLength(widthMm, units)} wide by ${formatLength(depthMm, units)} deep; ${
    section.area > 0
      ? `sound core ${formatLength(section.width, units)} by ${formatLength(section.depth, units)}`
      : 'no sound wood left'
  }.`;

  return (
    <View style={styles.wrap} testID="cross-section">
      <Svg
        width={VIEW_W}
        height={viewH}
        viewBox={`0 0 ${VIEW_W} ${viewH}`}
        style={styles.svg}
        accessibilityLabel={label}
        role="img"
      >
        <Defs>
          <Pattern
            id={`${id}-decay`}
            patternUnits="userSpaceOnUse"
            width={7}
            height={7}
            patternTransform="rotate(45)"
          >
            <Rect width={7} height={7} fill={colors.timberDark} />
            <Line x1={0} y1={0} x2={0} y2={7} stroke={colors.paper} strokeWidth={2} />
          </Pattern>
        </Defs>
        <Rect x={x0} y={y0} width={w} height={h} fill={colors.timber} />
        {FACES.map((f) =>
          bands[f].width > 0 && bands[f].height > 0 ? (
            <Rect key={f} {...bands[f]} fill={hatch} testID={`decay-band-${f}`} />
          ) : null,
        )}
        {coreW > 0 && coreH > 0 ? (
          <G testID="sound-core">
            <Rect
              x={x0 + left}
              y={y0 + top}
              width={coreW}
              height={coreH}
              fill="none"
              stroke={colors.ink}
              strokeWidth={2}
            />
            <Line
              x1={x0 + left - 6}
              x2={x0 + left + coreW + 6}
              y1={y0 + top + coreH / 2}
              y2={y0 + top + coreH / 2}
              stroke={colors.ink}
              strokeDasharray="5 4"
              strokeWidth={1}
            />
          </G>
        ) : null}
        <Rect x={x0} y={y0} width={w} height={h} fill="none" stroke={colors.ink} strokeWidth={1} />
        <SvgText
          x={x0 + w / 2}
          y={y0 + h + 24}
          textAnchor="middle"
          fontFamily={fonts.regular}
          fontSize={13}
          fill={colors.ink}
        >
          {`width ${formatLength(widthMm, units)}`}
        </SvgText>
        <SvgText
          x={PAD.left - 14}
          y={y0 + h / 2}
          textAnchor="middle"
          fontFamily={fonts.regular}
          fontSize={13}
          fill={colors.ink}
          transform={`rotate(-90 ${PAD.left - 14} ${y0 + h / 2})`}
        >
          {`depth ${formatLength(depthMm, units)}`}
        </SvgText>
        <SvgText
          x={x0 + w / 2}
          y={y0 - 8}
          textAnchor="middle"
          fontFamily={fonts.regular}
          fontSize={12}
          fill={colors.inkMuted}
        >
          top face
        </SvgText>
      </Svg>

      <View style={styles.legend}>
        <View style={styles.legendItem}>
          <View style={[styles.swatch, styles.swatchSound]} />
          <AppText variant="caption">Sound wood</AppText>
        </View>
        <View style={styles.legendItem}>
          <View style={[styles.swatch, styles.swatchDecay]}>
            <View style={styles.swatchStripe} />
          </View>
          <AppText variant="caption">Decayed, counted as nothing</AppText>
        </View>
        <View style={styles.legendItem}>
          <View style={styles.axis} />
          <AppText variant="caption">Bending axis</AppText>
        </View>
      </View>

      <View style={styles.ratios} accessibilityRole="summary">
        <Ratio label="Sound area left" ratio={section.areaRatio} testID="ratio-area" />
        <Ratio
          label="Strength (section modulus) left"
          ratio={section.sectionModulusRatio}
          testID="ratio-modulus"
        />
        <Ratio
          label="Stiffness (moment of inertia) left"
          ratio={section.momentOfInertiaRatio}
          testID="ratio-stiffness"
        />
      </View>
    </View>
  );
}

function Ratio({ label, ratio, testID }: { label: string; ratio: number; testID: string }) {
  return (
    <View style={styles.ratio} accessible accessibilityLabel={`${label}: ${percent(ratio)}`}>
      <View style={styles.ratioHead}>
        <AppText variant="caption" style={styles.ratioLabel}>
          {label}
        </AppText>
        <AppText variant="label" testID={testID}>
          {percent(ratio)}
        </AppText>
      </View>
      <View style={styles.track}>
        <View style={[styles.fill, { width: `${Math.round(ratio * 100)}%` }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  svg: { alignSelf: 'center' },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  swatch: { width: 18, height: 14, borderWidth: 1, borderColor: colors.ink, overflow: 'hidden' },
  swatchSound: { backgroundColor: colors.timber },
  swatchDecay: { backgroundColor: colors.timberDark, justifyContent: 'center' },
  swatchStripe: {
    height: 3,
    width: 26,
    marginLeft: -4,
    backgroundColor: colors.paper,
    transform: [{ rotate: '-35deg' }],
  },
  axis: { width: 22, borderTopWidth: 1, borderStyle: 'dashed', borderColor: colors.ink },
  ratios: { gap: spacing.sm },
  ratio: { gap: 4 },
  ratioHead: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm },
  ratioLabel: { flex: 1 },
  track: {
    height: 10,
    borderRadius: radius.pill,
    borderWidth: 1,
    borderColor: colors.ink,
    backgroundColor: colors.surface,
    overflow: 'hidden',
  },
  fill: { height: '100%', backgroundColor: colors.accent },
});
