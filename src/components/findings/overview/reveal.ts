import type { RefObject } from 'react';
import type { View } from 'react-native';

/** Native screens keep the diagram and sheet in one scroll view already in view; nothing to do. */
export function revealTop(_ref: RefObject<View | null>) {}
