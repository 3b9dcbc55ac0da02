import type { ReactNode } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, View } from 'react-native';
import { colors, radius, spacing, type as typeScale } from '@/src/theme';
import { AppText } from './app-text';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost';

type Props = {
  label: string;
  onPress?: () => void;
  variant?: ButtonVariant;
  loading?: boolean;
  disabled?: boolean;
  /** Spoken name when the visible label needs context ("Restore 1931 Halvard Tourer"). */
  accessibilityLabel?: string;
  icon?: ReactNode;
  compact?: boolean;
  testID?: string;
};

export function Button({
  label,
  onPress,
  variant = 'primary',
  loading,
  disabled,
  accessibilityLabel,
  icon,
  compact,
  testID,
}: Props) {
  const inactive = disabled || loading;
  const palette = PALETTES[variant];
  return (
    <Pressable
      testID={testID}
      onPress={inactive ? undefined : onPress}
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ disabled: !!inactive, busy: !!loading }}
      style={({ pressed }) => [
        styles.base,
        compact && styles.compact,
        { backgroundColor: palette.bg, borderColor: palette.border },
        pressed && !inactive && { backgroundColor: palette.pressed },
        inactive && styles.inactive,
      ]}
    >
      <View style={styles.row}>
        {loading ? <ActivityIndicator size="small" color={palette.ink} /> : icon}
        <AppText style={[styles.label, { color: palette.ink }]}>{label}</AppText>
      </View>
    </Pressable>
  );
}

const PALETTES: Record<
  ButtonVariant,
  { bg: string; border: string; ink: string; pressed: string }
> = {
  primary: { bg: colors.accent, border: colors.accent, ink: colors.accentInk, pressed: '#184A5B' },
  secondary: {
    bg: colors.surface,
    border: colors.accent,
    ink: colors.accent,
    pressed: colors.accentSoft,
  },
  danger: { bg: colors.danger, border: colors.danger, ink: colors.accentInk, pressed: '#84261F' },
  ghost: {
    bg: 'transparent',
    border: 'transparent',
    ink: colors.accent,
    pressed: colors.accentSoft,
  },
};

const styles = StyleSheet.create({
  base: {
    minHeight: 48,
    minWidth: 48,
    paddingHorizontal: spacing.lg,
    borderRadius: radius.md,
    borderWidth: 2,
    alignItems: 'center',
    justifyContent: 'center',
  },
  compact: { minHeight: 44, paddingHorizontal: spacing.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  label: { ...typeScale.label, fontSize: 16 },
  inactive: { opacity: 0.55 },
});
