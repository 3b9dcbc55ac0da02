import { useCallback, useId, useMemo, useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Polygon, Polyline, Text as SvgText } from 'react-native-svg';
import {
  polygonCentroid,
  zoneLabel,
  type BodyPlan,
  type BodyPlanView,
  type ViewKey,
} from '@/shared/body-plans';
import { colors, fonts, severityFill, severityInk } from '@/src/theme';
import { DiagramZone, type ZoneGeometry } from './diagram-zone';
import { HatchDefs, svgIdPrefix } from './hatch';
import { pressPoint } from './press-point';
import type { ViewPoint } from './view-point';
import { zoneStateLabel, type ZoneStateCue } from './zone-state';
import { zoneAccessibilityLabel, type DiagramPin, type ZoneSummary } from './zone-summary';

export type BodyDiagramProps = {
  plan: BodyPlan;
  view: ViewKey;
  zoneSummaries: Record<string, ZoneSummary>;
  pins: DiagramPin[];
  selectedZone?: string;
  /** Several chosen zones at once (picking the zones a treatment covered). */
  selectedZones?: readonly string[];
  /** Treatment state per zone, drawn as an outline pattern and a short word. */
  zoneStates?: Record<string, ZoneStateCue>;
  /** `point` is where the zone was pressed, in view units (absent for keyboard presses). */
  onZonePress(zoneKey: string, point?: ViewPoint): void;
  /** Cap on the drawn height, px; the drawing shrinks to fit, keeping its proportions. */
  maxHeight?: number;
  /** Draw at this width instead of the container's (an enlarged drawing inside a scroller). */
  width?: number;
  testID?: string;
};

// Until the container has been measured (and in tests, where it never is) draw at phone width.
const FALLBACK_WIDTH = 358;
/** Screen pixels from a pin's point up to the centre of its head. */
const PIN_STEM = 24;

/** The zoned body drawing for one view: fill and number by worst severity, pins, selection. */
export function BodyDiagram({
  plan,
  view: viewKey,
  zoneSummaries,
  pins,
  selectedZone,
  selectedZones,
  zoneStates,
  onZonePress,
  maxHeight = 520,
  width: fixedWidth,
  testID,
}: BodyDiagramProps) {
  const view = plan.views.find((v) => v.key === viewKey) ?? plan.views[0];
  const [containerWidth, setContainerWidth] = useState(0);
  const [hovered, setHovered] = useState<string | null>(null);
  const idPrefix = svgIdPrefix(useId());

  const available = fixedWidth ?? (containerWidth > 0 ? containerWidth : FALLBACK_WIDTH);
  const width = Math.min(available, maxHeight * (view.width / view.height));
  const height = width * (view.height / view.width);
  const scale = width / view.width;
  const unit = 1 / scale;

  const geometry = useMemo(() => zoneGeometry(view), [view]);
  const isSelected = useCallback(
    (key: string) => key === selectedZone || !!selectedZones?.includes(key),
    [selectedZone, selectedZones],
  );
  // Selected zones are drawn last so their outlines are not covered by their neighbours.
  const ordered = useMemo(
    () => [
      ...geometry.filter((z) => !isSelected(z.key)),
      ...geometry.filter((z) => isSelected(z.key)),
    ],
    [geometry, isSelected],
  );

  const handlePress = useCallback(
    (zoneKey: string, event: unknown) => onZonePress(zoneKey, pressPoint(event, scale)),
    [onZonePress, scale],
  );
  const onLayout = (e: LayoutChangeEvent) =>
    setContainerWidth(Math.round(e.nativeEvent.layout.width));

  return (
    <View
      style={[styles.container, fixedWidth ? { width: fixedWidth } : null]}
      onLayout={onLayout}
      testID={testID}
    >
      <Svg
        width={width}
        height={height}
        viewBox={`0 0 ${view.width} ${view.height}`}
        accessibilityLabel={`${plan.name}, ${view.title}`}
      >
        <HatchDefs prefix={idPrefix} unit={unit} />
        {view.outline.map((o, i) =>
          o.closed ? (
            <Polygon
              key={i}
              points={toPoints(o.points)}
              fill="none"
              stroke={colors.inkMuted}
              strokeWidth={1.25 * unit}
            />
          ) : (
            <Polyline
              key={i}
              points={toPoints(o.points)}
              fill="none"
              stroke={colors.inkMuted}
              strokeWidth={1.25 * unit}
            />
          ),
        )}
        {ordered.map((z) => (
          <DiagramZone
            key={z.key}
            zone={z}
            summary={zoneSummaries[z.key]}
            accessibilityLabel={[
              zoneAccessibilityLabel(zoneLabel(plan, z.key), zoneSummaries[z.key]),
              zoneStateLabel(zoneStates?.[z.key]),
            ]
              .filter(Boolean)
              .join(', ')}
            stateCue={zoneStates?.[z.key]}
            selected={isSelected(z.key)}
            hovered={z.key === hovered}
            unit={unit}
            idPrefix={idPrefix}
            onPress={handlePress}
            onHover={setHovered}
          />
        ))}
        {pins.map((p) => (
          // Pins let presses through: a tap on a pin lands on the zone under it, never on a
          // neighbour's pin. The head stands above the point, clear of the zone's own number.
          <G key={p.id} testID={'pin-' + p.id} pointerEvents="none">
            <Polyline
              points={toPoints([
                [p.x, p.y],
                [p.x, p.y - PIN_STEM * unit],
              ])}
              stroke={colors.ink}
              strokeWidth={1.5 * unit}
            />
            <Circle
              cx={p.x}
              cy={p.y - PIN_STEM * unit}
              r={8 * unit}
              fill={severityFill[p.severity]}
              stroke={colors.ink}
              strokeWidth={1.5 * unit}
            />
            <SvgText
              x={p.x}
              y={p.y - (PIN_STEM - 4) * unit}
              textAnchor="middle"
              fontSize={11 * unit}
              fontFamily={fonts.bold}
              fontWeight="bold"
              fill={severityInk[p.severity]}
            >
              {String(p.severity)}
            </SvgText>
          </G>
        ))}
      </Svg>
    </View>
  );
}

function toPoints(points: [number, number][]): string {
  return points.map(([x, y]) => `${x},${y}`).join(' ');
}

function area(points: [number, number][]): number {
  let a = 0;
  for (let i = 0; i < points.length; i++) {
    const [x1, y1] = points[i];
    const [x2, y2] = points[(i + 1) % points.length];
    a += x1 * y2 - x2 * y1;
  }
  return Math.abs(a / 2);
}

/** Group a view's shapes by zone (a member may be drawn in several pieces). */
function zoneGeometry(view: BodyPlanView): ZoneGeometry[] {
  const byZone = new Map<
    string,
    { polygons: string[]; largest: [number, number][]; largestArea: number }
  >();
  for (const s of view.shapes) {
    const a = area(s.points);
    const entry = byZone.get(s.zone);
    if (!entry)
      byZone.set(s.zone, { polygons: [toPoints(s.points)], largest: s.points, largestArea: a });
    else {
      entry.polygons.push(toPoints(s.points));
      if (a > entry.largestArea) {
        entry.largest = s.points;
        entry.largestArea = a;
      }
    }
  }
  return [...byZone.entries()].map(([key, e]) => ({
    key,
    polygons: e.polygons,
    labelAt: polygonCentroid(e.largest),
  }));
}

const styles = StyleSheet.create({
  container: { width: '100%', alignItems: 'center' },
});
