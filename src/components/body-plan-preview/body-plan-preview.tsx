import { memo } from 'react';
import Svg, { Polygon, Polyline } from 'react-native-svg';
import type { BodyPlan, ViewKey } from '@/shared/body-plans';
import { colors } from '@/src/theme';

type Props = { plan: BodyPlan; view?: ViewKey; width?: number; selected?: boolean };

const toPoints = (pts: [number, number][]) => pts.map(([x, y]) => `${x},${y}`).join(' ');

/**
 * A thumbnail of one view (the left side by default): outline strokes and the framing
 * members as flat shapes, scaled to `width`. Decorative; the picker names the plan in text.
 */
export const BodyPlanPreview = memo(function BodyPlanPreview({
  plan,
  view = 'left',
  width = 160,
  selected,
}: Props) {
  const v = plan.views.find((x) => x.key === view) ?? plan.views[0];
  if (!v) return null;
  const height = Math.round((width * v.height) / v.width);
  // Strokes are drawn in view units; keep them about 1.5 screen pixels whatever the scale.
  const unit = v.width / width;
  const member = selected ? colors.accentSoft : colors.surfaceSunken;
  const edge = selected ? colors.accent : colors.timberDark;
  return (
    <Svg
      width={width}
      height={height}
      viewBox={`0 0 ${v.width} ${v.height}`}
      accessibilityElementsHidden
      importantForAccessibility="no-hide-descendants"
      testID={`body-plan-preview-${plan.key}`}
    >
      {v.shapes.map((s, i) => (
        <Polygon
          key={`s${i}`}
          points={toPoints(s.points)}
          fill={member}
          stroke={edge}
          strokeWidth={unit}
        />
      ))}
      {v.outline.map((o, i) =>
        o.closed ? (
          <Polygon
            key={`o${i}`}
            points={toPoints(o.points)}
            fill="none"
            stroke={colors.ink}
            strokeWidth={unit * 1.5}
          />
        ) : (
          <Polyline
            key={`o${i}`}
            points={toPoints(o.points)}
            fill="none"
            stroke={colors.ink}
            strokeWidth={unit * 1.5}
          />
        ),
      )}
    </Svg>
  );
});
