import { Modal, Pressable, StyleSheet, View } from 'react-native';
import { colors, radius, spacing } from '@/src/theme';
import { AppText } from './app-text';
import { Button } from './button';

type Props = {
  visible: boolean;
  title: string;
  message: string;
  confirmLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
  busy?: boolean;
  /** Red confirm button for removals. */
  destructive?: boolean;
};

/** Asks before a destructive or hard-to-undo action; Cancel is the first, safe choice. */
export function ConfirmDialog({
  visible,
  title,
  message,
  confirmLabel,
  onConfirm,
  onCancel,
  busy,
  destructive = true,
}: Props) {
  return (
    <Modal visible={visible} transparent animationType="fade" onRequestClose={onCancel}>
      <View style={styles.backdrop}>
        <Pressable style={StyleSheet.absoluteFill} onPress={onCancel} accessibilityLabel="Close" />
        <View style={styles.dialog} accessibilityRole="alert" aria-modal testID="confirm-dialog">
          <AppText variant="title">{title}</AppText>
          <AppText>{message}</AppText>
          <View style={styles.actions}>
            <Button label="Cancel" variant="secondary" onPress={onCancel} testID="confirm-cancel" />
            <Button
              label={confirmLabel}
              variant={destructive ? 'danger' : 'primary'}
              onPress={onConfirm}
              loading={busy}
              testID="confirm-ok"
            />
          </View>
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    padding: spacing.lg,
    backgroundColor: 'rgba(31, 42, 48, 0.55)',
  },
  dialog: {
    width: '100%',
    maxWidth: 440,
    gap: spacing.md,
    padding: spacing.xl,
    borderRadius: radius.lg,
    backgroundColor: colors.surface,
  },
  actions: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    justifyContent: 'flex-end',
    gap: spacing.sm,
    marginTop: spacing.sm,
  },
});
