import { StyleSheet, View } from 'react-native';
import type { TreatmentMethod } from '@/shared/schemas/treatment';
import { cautionsFor } from '@/shared/treatments/cautions';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

/**
 * What to keep in mind before a treatment is saved: our cautions with their sources (those
 * bearing on the chosen method first), then the workshop's own notes on local rules.
 */
export function CautionsPanel({
  method,
  regulatoryNotes,
  region,
}: {
  method: TreatmentMethod | null;
  regulatoryNotes: string;
  region?: string;
}) {
  return (
    <View style={styles.panel} testID="treatment-cautions" accessibilityLabel="Cautions">
      <AppText variant="title" accessibilityRole="header">
        Before you save
      </AppText>
      <AppText variant="caption">
        Soundframe never suggests a product, dose or rate: everything here is recorded from the
        label you followed.
      </AppText>
      {cautionsFor(method).map((c) => (
        <View key={c.key} style={styles.item} testID={`caution-${c.key}`}>
          <AppText variant="label">{c.title}</AppText>
          <AppText variant="caption">{c.text}</AppText>
          <AppText variant="caption" muted>
            Source: {c.source}
          </AppText>
        </View>
      ))}
      <View style={[styles.item, styles.local]} testID="treatment-regulatory-notes">
        <AppText variant="label">Local rules{region ? ` (${region})` : ''}</AppText>
        <AppText variant="caption">
          {regulatoryNotes.trim()
            ? regulatoryNotes
            : 'The workshop owner has not added notes on local rules. Check them where the work is done.'}
        </AppText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radius.lg,
    borderWidth: 2,
    borderColor: colors.caution,
    backgroundColor: colors.cautionSoft,
  },
  item: { gap: 2, paddingTop: spacing.sm, borderTopWidth: 1, borderTopColor: colors.line },
  local: { borderLeftWidth: 4, borderLeftColor: colors.caution, paddingLeft: spacing.sm },
});
