import type { ReactNode } from 'react';
import { View } from 'react-native';
import { spacing } from '@/src/theme';
import { AppText } from './app-text';

/** A titled part of a reading page (no rule above it, unlike FormSection); `gap` between its parts. */
export function Section({
  title,
  children,
  testID,
  gap = 'sm',
}: {
  title: string;
  children: ReactNode;
  testID?: string;
  gap?: 'xs' | 'sm' | 'md';
}) {
  return (
    <View style={{ gap: spacing[gap] }} testID={testID}>
      <AppText variant="title" accessibilityRole="header">
        {title}
      </AppText>
      {children}
    </View>
  );
}
