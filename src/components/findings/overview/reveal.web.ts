import type { RefObject } from 'react';
import type { View } from 'react-native';

/**
 * On a phone the zone sheet sits under the drawing; scrolling the drawing to the top of the
 * page brings the sheet into view without losing the drawing. react-native-web Views are DOM nodes.
 */
export function revealTop(ref: RefObject<View | null>) {
  const node = ref.current as unknown as HTMLElement | null;
  requestAnimationFrame(() => node?.scrollIntoView?.({ block: 'start', behavior: 'smooth' }));
}
