import { Defs, Line, Pattern } from 'react-native-svg';
import { severityInk } from '@/src/theme';

/** Severities that also get a hatch, so the worst levels read without colour. */
export const HATCHED: Record<number, 'single' | 'cross'> = { 3: 'single', 4: 'cross' };

export function hatchId(prefix: string, severity: number): string {
  return `${prefix}-hatch-${severity}`;
}

/**
 * Diagonal hatch for severity 3 and cross-hatch for 4. `unit` is one screen pixel in drawing
 * units, so the hatch keeps the same density however large the drawing is shown.
 */
export function HatchDefs({ prefix, unit }: { prefix: string; unit: number }) {
  const size = 7 * unit;
  const stroke = 1.4 * unit;
  return (
    <Defs>
      {Object.entries(HATCHED).map(([severity, kind]) => {
        const ink = severityInk[Number(severity)];
        return (
          <Pattern
            key={severity}
            id={hatchId(prefix, Number(severity))}
            patternUnits="userSpaceOnUse"
            width={size}
            height={size}
            patternTransform="rotate(45)"
          >
            <Line
              x1={0}
              y1={0}
              x2={0}
              y2={size}
              stroke={ink}
              strokeOpacity={0.5}
              strokeWidth={stroke}
            />
            {kind === 'cross' ? (
              <Line
                x1={0}
                y1={0}
                x2={size}
                y2={0}
                stroke={ink}
                strokeOpacity={0.5}
                strokeWidth={stroke}
              />
            ) : null}
          </Pattern>
        );
      })}
    </Defs>
  );
}

/** An id prefix that is safe inside url(#…) whatever React's useId returns. */
export function svgIdPrefix(reactId: string): string {
  return 'sf' + reactId.replace(/[^a-zA-Z0-9_-]/g, '');
}
