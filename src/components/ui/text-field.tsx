import { useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, radius, spacing, type as typeScale } from '@/src/theme';
import { AppText } from './app-text';

type Props = Omit<TextInputProps, 'style' | 'placeholderTextColor'> & {
  label: string;
  error?: string | null;
  hint?: string;
  /** Short unit shown after the input, e.g. "°C". */
  suffix?: string;
};

/** Props of a field for a decimal number: the decimal keypad on phones, a hint to the web. */
export const NUMERIC_INPUT = { keyboardType: 'decimal-pad', inputMode: 'decimal' } as const;

/** An e-mail address field: no auto-capitalising, the e-mail keyboard. */
export function EmailField(props: Omit<Props, 'label'> & { label?: string }) {
  return (
    <TextField
      label="E-mail"
      autoCapitalize="none"
      autoComplete="email"
      keyboardType="email-address"
      inputMode="email"
      {...props}
    />
  );
}

/** A labelled input; the error sits right under the label so it is read with the field. */
export function TextField({ label, error, hint, suffix, multiline, testID, ...input }: Props) {
  const [focused, setFocused] = useState(false);
  return (
    <View style={styles.wrap}>
      <AppText variant="label" nativeID={testID ? `${testID}-label` : undefined}>
        {label}
      </AppText>
      {hint ? (
        <AppText variant="caption" muted>
          {hint}
        </AppText>
      ) : null}
      {error ? (
        <AppText
          variant="caption"
          style={styles.error}
          accessibilityRole="alert"
          testID={testID ? `${testID}-error` : undefined}
        >
          {error}
        </AppText>
      ) : null}
      <View style={styles.row}>
        <TextInput
          {...input}
          testID={testID}
          multiline={multiline}
          accessibilityLabel={label}
          accessibilityHint={error ?? hint}
          aria-invalid={!!error}
          placeholderTextColor={colors.inkMuted}
          onFocus={(e) => {
            setFocused(true);
            input.onFocus?.(e);
          }}
          onBlur={(e) => {
            setFocused(false);
            input.onBlur?.(e);
          }}
          style={[
            styles.input,
            multiline && styles.multiline,
            focused && styles.focused,
            !!error && styles.invalid,
          ]}
        />
        {suffix ? <AppText style={styles.suffix}>{suffix}</AppText> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  input: {
    ...typeScale.body,
    flex: 1,
    // react-native-web gives inputs an intrinsic width; without this a narrow column overflows.
    minWidth: 0,
    minHeight: 48,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderWidth: 2,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    color: colors.ink,
  },
  multiline: { minHeight: 110, textAlignVertical: 'top' },
  focused: { borderColor: colors.accent },
  invalid: { borderColor: colors.danger },
  error: { color: colors.danger, fontFamily: typeScale.label.fontFamily },
  suffix: { minWidth: 28 },
});
