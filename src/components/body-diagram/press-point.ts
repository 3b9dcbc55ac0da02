import type { GestureResponderEvent } from 'react-native';
import { roundPoint, type ViewPoint } from './view-point';

/**
 * Where a press landed, in view units. Native touch locations are in points relative to the
 * drawing, so dividing by the drawing's scale (points per view unit) gives view units.
 */
export function pressPoint(event: unknown, scale: number): ViewPoint | undefined {
  const native = (event as GestureResponderEvent | undefined)?.nativeEvent;
  if (
    !native ||
    typeof native.locationX !== 'number' ||
    typeof native.locationY !== 'number' ||
    scale <= 0
  )
    return undefined;
  return roundPoint(native.locationX / scale, native.locationY / scale);
}
