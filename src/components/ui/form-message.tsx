import { StyleSheet, View } from 'react-native';
import { colors, radius, spacing } from '@/src/theme';
import { AppText } from './app-text';

/** A form-level error (not tied to one field), read out when it appears. */
export function FormMessage({
  message,
  testID = 'form-message',
}: {
  message: string | null;
  testID?: string;
}) {
  if (!message) return null;
  return (
    <View style={styles.box} accessibilityRole="alert" testID={testID}>
      <AppText>{message}</AppText>
    </View>
  );
}

/** Beside a long form's submit button: the field messages may be scrolled out of view. */
export function FieldErrorsNotice({ errors }: { errors: Record<string, string> }) {
  const count = Object.keys(errors).length;
  if (!count) return null;
  return (
    <AppText
      variant="label"
      style={styles.notice}
      accessibilityRole="alert"
      testID="field-errors-notice"
    >
      {count === 1
        ? 'One field needs attention; see its message above.'
        : `${count} fields need attention; see the messages above.`}
    </AppText>
  );
}

const styles = StyleSheet.create({
  box: {
    padding: spacing.md,
    borderRadius: radius.md,
    borderLeftWidth: 6,
    borderLeftColor: colors.danger,
    backgroundColor: colors.dangerSoft,
  },
  notice: { color: colors.danger, textAlign: 'right' },
});
