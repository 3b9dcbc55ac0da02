import { useId } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Rect, Text as SvgText } from 'react-native-svg';
import { SEVERITIES, SEVERITY_LABELS } from '@/shared/schemas';
import { colors, fonts, severityFill, severityInk, spacing, type, unloggedFill } from '@/src/theme';
import { HATCHED, HatchDefs, hatchId, svgIdPrefix } from './hatch';

/** What the fills, numbers and hatches mean; drawn with the same swatches as the diagram. */
export function DiagramLegend() {
  const prefix = svgIdPrefix(useId());
  return (
    <View style={styles.wrap} testID="diagram-legend" accessibilityLabel="Legend">
      {SEVERITIES.map((s) => (
        <View key={s} style={styles.item} testID={'legend-' + s}>
          <Swatch prefix={prefix} severity={s} />
          <Text style={styles.text}>
            {s} {SEVERITY_LABELS[s].title}
          </Text>
        </View>
      ))}
      <View style={styles.item} testID="legend-none">
        <Swatch prefix={prefix} severity={null} />
        <Text style={styles.text}>Nothing logged</Text>
      </View>
    </View>
  );
}

function Swatch({ prefix: base, severity }: { prefix: string; severity: number | null }) {
  // Each swatch is its own <svg>; ids must stay unique across them on one page.
  const prefix = `${base}-${severity ?? 'none'}`;
  return (
    <Svg
      width={30}
      height={22}
      viewBox="0 0 30 22"
      accessibilityElementsHidden
      importantForAccessibility="no"
    >
      {severity !== null && HATCHED[severity] ? <HatchDefs prefix={prefix} unit={1} /> : null}
      <Rect
        x={1}
        y={1}
        width={28}
        height={20}
        rx={4}
        fill={severity === null ? unloggedFill : severityFill[severity]}
        stroke={colors.timberDark}
      />
      {severity !== null && HATCHED[severity] ? (
        <Rect
          x={1}
          y={1}
          width={28}
          height={20}
          rx={4}
          fill={`url(#${hatchId(prefix, severity)})`}
        />
      ) : null}
      {severity !== null ? (
        <SvgText
          x={15}
          y={15.5}
          textAnchor="middle"
          fontSize={13}
          fontFamily={fonts.bold}
          fontWeight="bold"
          fill={severityInk[severity]}
        >
          {String(severity)}
        </SvgText>
      ) : null}
    </Svg>
  );
}

const styles = StyleSheet.create({
  wrap: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    columnGap: spacing.lg,
    rowGap: spacing.sm,
    paddingVertical: spacing.sm,
  },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  text: { ...type.caption, color: colors.ink },
});
