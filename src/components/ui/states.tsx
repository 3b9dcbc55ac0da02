import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { cleanError } from '@/src/api/client';
import { colors, radius, spacing } from '@/src/theme';
import { AppText } from './app-text';
import { Button } from './button';

/** A failed query: the content is replaced by plain words and a way to try again. */
export function ErrorView({
  error,
  onRetry,
  title = 'This could not be loaded',
}: {
  error: unknown;
  onRetry?: () => void;
  title?: string;
}) {
  return (
    <View style={[styles.box, styles.errorBox]} accessibilityRole="alert" testID="error-view">
      <AppText variant="title">{title}</AppText>
      <AppText>{cleanError(error)}</AppText>
      {onRetry ? (
        <Button label="Try again" variant="secondary" onPress={onRetry} testID="error-retry" />
      ) : null}
    </View>
  );
}

export function EmptyState({
  title,
  message,
  action,
}: {
  title: string;
  message?: string;
  action?: ReactNode;
}) {
  return (
    <View style={styles.box} testID="empty-state">
      <AppText variant="title">{title}</AppText>
      {message ? <AppText muted>{message}</AppText> : null}
      {action}
    </View>
  );
}

export function LoadingView({ label = 'Loading…' }: { label?: string }) {
  return (
    <View
      style={styles.loading}
      accessibilityRole="progressbar"
      accessibilityLabel={label}
      testID="loading-view"
    >
      <ActivityIndicator size="large" color={colors.accent} />
      <AppText muted>{label}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.md,
    padding: spacing.xl,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
    alignItems: 'flex-start',
  },
  errorBox: { borderColor: colors.danger, borderLeftWidth: 6 },
  loading: {
    flex: 1,
    minHeight: 200,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.md,
  },
});
