import { StyleSheet, Text, type TextProps } from 'react-native';
import { colors, type as typeScale } from '@/src/theme';

export type TextVariant = 'body' | 'caption' | 'label' | 'title' | 'heading';

/** Text in the app's face and scale; `muted` for secondary lines. */
export function AppText({
  variant = 'body',
  muted,
  style,
  ...rest
}: TextProps & { variant?: TextVariant; muted?: boolean }) {
  return <Text {...rest} style={[styles.base, typeScale[variant], muted && styles.muted, style]} />;
}

const styles = StyleSheet.create({
  base: { color: colors.ink },
  muted: { color: colors.inkMuted },
});
