import Svg, { Circle, Path, Rect } from 'react-native-svg';
import type { NavKey } from './nav-items';

/** Small line drawings of our own for the navigation entries (always shown with a text label). */
export function NavIcon({
  name,
  color,
  size = 24,
}: {
  name: NavKey;
  color: string;
  size?: number;
}) {
  const stroke = {
    stroke: color,
    strokeWidth: 2,
    fill: 'none',
    strokeLinecap: 'round' as const,
    strokeLinejoin: 'round' as const,
  };
  return (
    <Svg
      width={size}
      height={size}
      viewBox="0 0 24 24"
      accessibilityElementsHidden
      importantForAccessibility="no"
    >
      {name === 'due' ? (
        <>
          {/* A calendar page with a tick: the day's re-checks. */}
          <Rect x={3.5} y={5} width={17} height={15} rx={2} {...stroke} />
          <Path d="M3.5 9.5 H20.5 M8 3 V6.5 M16 3 V6.5" {...stroke} />
          <Path d="M8.5 14.5 L11 17 L15.5 12.5" {...stroke} />
        </>
      ) : null}
      {name === 'vehicles' ? (
        <>
          <Path d="M2 16 V12 L5 11 L8 7 H15 L19 11 L22 12 V16 Z" {...stroke} />
          <Path d="M8 7 V11 M12 7 V11" {...stroke} />
          <Circle cx={6.5} cy={16.5} r={2} {...stroke} />
          <Circle cx={17.5} cy={16.5} r={2} {...stroke} />
        </>
      ) : null}
      {name === 'team' ? (
        <>
          <Circle cx={8} cy={8} r={3} {...stroke} />
          <Path d="M2.5 19 C3 15 5 13.5 8 13.5 C11 13.5 13 15 13.5 19" {...stroke} />
          <Circle cx={16.5} cy={9} r={2.5} {...stroke} />
          <Path d="M15 14 C18.5 13.5 21 15 21.5 18.5" {...stroke} />
        </>
      ) : null}
      {name === 'mail' ? (
        <>
          <Rect x={3} y={5.5} width={18} height={13} rx={2} {...stroke} />
          <Path d="M3.5 7 L12 13 L20.5 7" {...stroke} />
        </>
      ) : null}
      {name === 'settings' ? (
        <>
          {/* Three sliders; the lines stop at each knob so it reads on any background. */}
          <Path d="M4 7 H7 M11 7 H20 M4 12 H13 M17 12 H20 M4 17 H5 M9 17 H20" {...stroke} />
          <Circle cx={9} cy={7} r={2} {...stroke} />
          <Circle cx={15} cy={12} r={2} {...stroke} />
          <Circle cx={7} cy={17} r={2} {...stroke} />
        </>
      ) : null}
      {name === 'account' ? (
        <>
          <Circle cx={12} cy={8.5} r={3.5} {...stroke} />
          <Path d="M5 20 C5.5 15.5 8 13.5 12 13.5 C16 13.5 18.5 15.5 19 20" {...stroke} />
        </>
      ) : null}
    </Svg>
  );
}
