import { Image, StyleSheet, View } from 'react-native';
import { AppText, Button } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import type { PhotoSource, QueuedPhoto } from './use-photo-queue';

const STATUS: Record<QueuedPhoto['status'], string> = {
  waiting: 'Uploads when you save',
  uploading: 'Uploading…',
  done: 'Uploaded',
  failed: 'Not uploaded',
  rejected: 'Not added',
};

/**
 * Pick from the camera or the library (on web: the file chooser) and see each photo's upload
 * state. `onRetry` is offered once the finding exists; before that photos just wait for Save.
 */
export function PhotoPicker({
  items,
  onPick,
  onRemove,
  onRetry,
  disabled,
}: {
  items: QueuedPhoto[];
  onPick(source: PhotoSource): void;
  onRemove(key: string): void;
  onRetry?: (key: string) => void;
  disabled?: boolean;
}) {
  return (
    <View style={styles.group}>
      <View style={styles.buttons}>
        <Button
          label="Add photos"
          variant="secondary"
          onPress={() => onPick('library')}
          disabled={disabled}
          testID="photo-add"
        />
        <Button
          label="Take a photo"
          variant="secondary"
          onPress={() => onPick('camera')}
          disabled={disabled}
          testID="photo-camera"
        />
      </View>
      <AppText variant="caption" muted>
        JPEG, PNG or WebP, up to 15 MB each. Location and camera details are removed when stored.
      </AppText>
      {items.map((p, i) => (
        <View key={p.key} style={styles.item} testID={`photo-queued-${i}`}>
          <Image source={{ uri: p.uri }} style={styles.preview} accessibilityLabel={p.name} />
          <View style={styles.text}>
            <AppText variant="label" numberOfLines={1}>
              {p.name}
            </AppText>
            <AppText
              variant="caption"
              style={
                p.status === 'failed' || p.status === 'rejected'
                  ? styles.bad
                  : p.status === 'done'
                    ? styles.good
                    : styles.muted
              }
              testID={`photo-status-${i}`}
              accessibilityLiveRegion="polite"
            >
              {STATUS[p.status]}
              {p.error ? `: ${p.error}` : ''}
            </AppText>
            {p.status !== 'uploading' && p.status !== 'done' ? (
              <View style={styles.actions}>
                {p.status === 'failed' && onRetry ? (
                  <Button
                    label="Retry"
                    compact
                    variant="secondary"
                    onPress={() => onRetry(p.key)}
                    testID={`photo-retry-${i}`}
                  />
                ) : null}
                <Button
                  label="Remove"
                  compact
                  variant="ghost"
                  accessibilityLabel={`Remove ${p.name}`}
                  onPress={() => onRemove(p.key)}
                  testID={`photo-drop-${i}`}
                />
              </View>
            ) : null}
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: spacing.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  item: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: spacing.md,
    padding: spacing.sm,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
  },
  preview: {
    width: 56,
    height: 56,
    borderRadius: radius.sm,
    backgroundColor: colors.surfaceSunken,
  },
  text: { flex: 1, gap: 2 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs, marginTop: spacing.xs },
  bad: { color: colors.danger, fontWeight: 'bold' },
  good: { color: colors.ok },
  muted: { color: colors.inkMuted },
});
