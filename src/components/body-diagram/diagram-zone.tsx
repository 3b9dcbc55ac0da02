import { memo } from 'react';
import { Platform } from 'react-native';
import { Circle, G, Polygon, Text as SvgText } from 'react-native-svg';
import { colors, fonts, severityFill, severityInk, unloggedFill } from '@/src/theme';
import { HATCHED, hatchId } from './hatch';
import { ZONE_STATE_DASH, ZONE_STATE_SHORT, type ZoneStateCue } from './zone-state';
import type { ZoneSummary } from './zone-summary';

export type ZoneGeometry = {
  key: string;
  /** One or more polygons, already as SVG `points` strings. */
  polygons: string[];
  /** Where the severity number sits (centroid of the zone's largest polygon). */
  labelAt: [number, number];
};

type Props = {
  zone: ZoneGeometry;
  summary: ZoneSummary | undefined;
  accessibilityLabel: string;
  stateCue?: ZoneStateCue;
  selected: boolean;
  hovered: boolean;
  /** One screen pixel in drawing units. */
  unit: number;
  idPrefix: string;
  onPress(zoneKey: string, event: unknown): void;
  onHover(zoneKey: string | null): void;
};

/**
 * One tappable zone: its polygons, the hatch overlay for the worst levels and the severity
 * number. The press handler sits on the group so the number never swallows a tap (web).
 */
export const DiagramZone = memo(function DiagramZone({
  zone,
  summary,
  accessibilityLabel,
  stateCue,
  selected,
  hovered,
  unit,
  idPrefix,
  onPress,
  onHover,
}: Props) {
  const severity = summary && summary.count > 0 ? summary.worstSeverity : null;
  const fill = severity === null ? unloggedFill : severityFill[severity];
  const stroke = selected ? colors.accent : hovered ? colors.accent : colors.timberDark;
  const strokeWidth = (selected ? 4 : hovered ? 2.5 : 1.25) * unit;
  const hatch =
    severity !== null && HATCHED[severity] ? `url(#${hatchId(idPrefix, severity)})` : null;
  const r = 10 * unit;
  const dash = stateCue ? ZONE_STATE_DASH[stateCue.state] : null;
  const word = stateCue
    ? stateCue.flagged
      ? `! ${ZONE_STATE_SHORT[stateCue.state] ?? ''}`.trim()
      : ZONE_STATE_SHORT[stateCue.state]
    : null;
  const wordY = zone.labelAt[1] + (severity !== null ? r + 11 * unit : 4 * unit);

  return (
    <G
      testID={'zone-' + zone.key}
      accessible
      accessibilityLabel={accessibilityLabel}
      onPress={(e: unknown) => onPress(zone.key, e)}
      {...webProps(zone.key, onPress, onHover, accessibilityLabel, selected)}
    >
      {zone.polygons.map((points, i) => (
        <Polygon
          key={i}
          points={points}
          fill={fill}
          stroke={stroke}
          strokeWidth={strokeWidth}
          strokeLinejoin="round"
        />
      ))}
      {hatch
        ? zone.polygons.map((points, i) => <Polygon key={`h${i}`} points={points} fill={hatch} />)
        : null}
      {dash
        ? zone.polygons.map((points, i) => (
            <Polygon
              key={`s${i}`}
              points={points}
              fill="none"
              stroke={colors.ink}
              strokeWidth={2.5 * unit}
              strokeDasharray={dash.length ? dash.map((d) => d * unit).join(' ') : undefined}
              strokeLinecap="round"
              strokeLinejoin="round"
            />
          ))
        : null}
      {word
        ? // Drawn twice: a paper-coloured halo first so the word reads over any fill or hatch.
          [true, false].map((halo) => (
            <SvgText
              key={halo ? 'halo' : 'word'}
              testID={halo ? undefined : `zone-state-${zone.key}`}
              x={zone.labelAt[0]}
              y={wordY}
              textAnchor="middle"
              fontSize={9 * unit}
              fontFamily={fonts.bold}
              fontWeight="bold"
              fill={colors.ink}
              stroke={halo ? colors.surface : undefined}
              strokeWidth={halo ? 3 * unit : undefined}
            >
              {word}
            </SvgText>
          ))
        : null}
      {severity !== null ? (
        <G>
          <Circle
            cx={zone.labelAt[0]}
            cy={zone.labelAt[1]}
            r={r}
            fill={severityFill[severity]}
            stroke={severityInk[severity]}
            strokeWidth={1.25 * unit}
          />
          <SvgText
            x={zone.labelAt[0]}
            y={zone.labelAt[1] + 4.5 * unit}
            textAnchor="middle"
            fontSize={13 * unit}
            fontFamily={fonts.bold}
            fontWeight="bold"
            fill={severityInk[severity]}
          >
            {String(severity)}
          </SvgText>
        </G>
      ) : null}
    </G>
  );
});

/** Mouse hover and keyboard activation exist only in the browser. */
function webProps(
  key: string,
  onPress: Props['onPress'],
  onHover: Props['onHover'],
  label: string,
  selected: boolean,
): Record<string, unknown> {
  if (Platform.OS !== 'web') return {};
  return {
    // role="button" would make react-native-web emit a <button> inside the SVG. Keyboard focus
    // shows as the hover outline (and the app's focus ring), not the browser's box.
    'aria-roledescription': 'zone',
    'aria-label': label,
    'aria-pressed': selected,
    tabIndex: 0,
    style: { cursor: 'pointer', outline: 'none' },
    onMouseEnter: () => onHover(key),
    onMouseLeave: () => onHover(null),
    onFocus: () => onHover(key),
    onBlur: () => onHover(null),
    onKeyDown: (e: { key: string; preventDefault(): void }) => {
      if (e.key === 'Enter' || e.key === ' ') {
        e.preventDefault();
        onPress(key, undefined);
      }
    },
  };
}
