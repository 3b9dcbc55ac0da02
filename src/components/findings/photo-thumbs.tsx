import { Image, Pressable, StyleSheet, View } from 'react-native';
import type { PhotoResponse } from '@/shared/schemas';
import { API_BASE } from '@/src/api/client';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

/** Photo URLs from the API are same-origin paths; the session cookie authorizes them. */
export function photoUri(url: string): string {
  return /^https?:\/\//.test(url) ? url : API_BASE + url;
}

/** A finding's saved photos as thumbnails; with `onRemove`, each has a remove control. */
export function PhotoThumbs({
  photos,
  size = 72,
  onRemove,
  onOpen,
}: {
  photos: PhotoResponse[];
  size?: number;
  onRemove?: (photo: PhotoResponse) => void;
  onOpen?: (photo: PhotoResponse) => void;
}) {
  if (!photos.length) return null;
  return (
    <View style={styles.row} testID="photo-thumbs">
      {photos.map((p, i) => {
        const image = (
          <Image
            source={{ uri: photoUri(p.thumbUrl) }}
            style={[styles.thumb, { width: size, height: size }]}
            accessibilityLabel={p.caption || `Photo ${i + 1}`}
            testID={'photo-thumb-' + p.id}
          />
        );
        return (
          <View key={p.id} style={styles.item}>
            {onOpen ? (
              <Pressable
                onPress={() => onOpen(p)}
                accessibilityRole="imagebutton"
                accessibilityLabel={`Open photo ${i + 1}`}
              >
                {image}
              </Pressable>
            ) : (
              image
            )}
            {onRemove ? (
              <Pressable
                onPress={() => onRemove(p)}
                accessibilityRole="button"
                accessibilityLabel={`Remove photo ${i + 1}`}
                testID={'photo-remove-' + p.id}
                style={styles.remove}
              >
                <AppText variant="caption" style={styles.removeText}>
                  Remove
                </AppText>
              </Pressable>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  item: { alignItems: 'center', gap: 2 },
  thumb: {
    borderRadius: radius.sm,
    backgroundColor: colors.surfaceSunken,
    borderWidth: 1,
    borderColor: colors.line,
  },
  remove: { minHeight: 32, justifyContent: 'center', paddingHorizontal: spacing.xs },
  removeText: { color: colors.danger, fontWeight: 'bold' },
});
