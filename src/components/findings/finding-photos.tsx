import { StyleSheet, View } from 'react-native';
import type { FindingResponse, PhotoResponse } from '@/shared/schemas';
import { AppText, useToast } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { PhotoPicker } from './photo-picker';
import { PhotoThumbs } from './photo-thumbs';
import type { PhotoQueue } from './use-photo-queue';

/** The form's photo section: photos already stored, then those picked and waiting or uploading. */
export function FindingPhotos({
  saved,
  queue,
  canAdd,
  busy,
  onRemoveStored,
}: {
  saved: FindingResponse | null;
  queue: PhotoQueue;
  canAdd: boolean;
  busy: boolean;
  onRemoveStored(photo: PhotoResponse): void;
}) {
  const toast = useToast();
  return (
    <View style={styles.section}>
      <AppText variant="label">Photos</AppText>
      {saved ? (
        <PhotoThumbs photos={saved.photos} onRemove={canAdd ? onRemoveStored : undefined} />
      ) : null}
      {canAdd ? (
        <PhotoPicker
          items={queue.items}
          onPick={async (source) => {
            const problem = await queue.pick(source);
            if (problem) toast.show(problem, { kind: 'error' });
          }}
          onRemove={queue.remove}
          onRetry={saved ? (key) => queue.retry(key, saved.id) : undefined}
          disabled={busy}
        />
      ) : (
        <AppText variant="caption" muted>
          Your role cannot add photos.
        </AppText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.sm },
});
