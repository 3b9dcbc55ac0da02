import { StyleSheet, View } from 'react-native';
import { INSECT_EVIDENCE_LABELS, PICK_TEST_LABELS, type FindingResponse } from '@/shared/schemas';
import { AppText, Badge, Button, Card, SeverityBadge } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import { ACTIVITY_LABELS, DECAY_TYPE_LABELS, speciesLabel } from './labels';
import { PhotoThumbs } from './photo-thumbs';
import { formatDay, formatMoment } from '@/src/format/dates';

type Props = {
  finding: FindingResponse;
  /** Sheet cards show the essentials; history cards show every measurement. */
  detail?: 'brief' | 'full';
  onEdit?: () => void;
  onRestore?: () => void;
  restoring?: boolean;
};

export function evidenceText(f: FindingResponse): string {
  return f.insectEvidence.length
    ? f.insectEvidence.map((k) => INSECT_EVIDENCE_LABELS[k]).join(', ')
    : 'No insect evidence';
}

export function moistureText(f: FindingResponse): string | null {
  if (!f.moisture) return null;
  const temp = f.moisture.woodTempC === null ? '' : ` at ${f.moisture.woodTempC} °C`;
  const species = f.moisture.species ? `, meter set for ${speciesLabel(f.moisture.species)}` : '';
  return `Meter ${f.moisture.meterReading} %${temp}${species}`;
}

function depthText(f: FindingResponse): string | null {
  const d = f.decayDepthMm;
  if (!d.top && !d.bottom && !d.left && !d.right) return null;
  return `Decay depth: top ${d.top}, bottom ${d.bottom}, left ${d.left}, right ${d.right} mm`;
}

/** One finding: severity (number and word), what was seen, when and by whom, photos. */
export function FindingCard({ finding: f, detail = 'brief', onEdit, onRestore, restoring }: Props) {
  const removed = !!f.deletedAt;
  const lines =
    detail === 'full'
      ? [
          `Activity: ${ACTIVITY_LABELS[f.activity]}`,
          f.holeDiameterMm !== null ? `Largest exit hole ${f.holeDiameterMm} mm` : null,
          moistureText(f),
          f.pickTest !== 'not-done' ? `Pick test: ${PICK_TEST_LABELS[f.pickTest]}` : null,
          depthText(f),
          f.affectedLengthMm !== null ? `Affected length ${f.affectedLengthMm} mm` : null,
          f.atJointOrFitting ? 'At a joint or fitting' : null,
        ].filter((l): l is string => !!l)
      : [];
  return (
    <Card style={removed ? styles.removed : undefined} testID={'finding-' + f.id}>
      <View style={styles.head}>
        <SeverityBadge severity={f.severity} testID={'finding-severity-' + f.id} />
        <AppText variant="label" style={styles.decay}>
          {DECAY_TYPE_LABELS[f.decayType].label}
        </AppText>
        {removed ? <Badge label="Removed" tone="danger" /> : null}
      </View>
      <AppText>{evidenceText(f)}</AppText>
      {lines.map((l) => (
        <AppText key={l} variant="caption">
          {l}
        </AppText>
      ))}
      {detail === 'full' && f.notes ? <AppText style={styles.notes}>{f.notes}</AppText> : null}
      <PhotoThumbs photos={f.photos} size={detail === 'full' ? 96 : 64} />
      <AppText variant="caption" muted>
        Survey of {formatDay(f.surveyDate)}
        {f.authorName ? ` · logged by ${f.authorName}` : ''}
        {detail === 'full' ? ` · ${formatMoment(f.createdAt)}` : ''}
      </AppText>
      {onEdit || onRestore ? (
        <View style={styles.actions}>
          {onEdit && !removed ? (
            <Button
              label="Edit"
              variant="secondary"
              compact
              onPress={onEdit}
              testID={'finding-edit-' + f.id}
            />
          ) : null}
          {onRestore && removed ? (
            <Button
              label="Restore"
              variant="secondary"
              compact
              onPress={onRestore}
              loading={restoring}
              testID={'finding-restore-' + f.id}
            />
          ) : null}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: spacing.sm },
  decay: { flexShrink: 1 },
  notes: { fontStyle: 'italic' },
  removed: { opacity: 0.75, borderStyle: 'dashed', borderColor: colors.danger },
  actions: { flexDirection: 'row', gap: spacing.sm, flexWrap: 'wrap' },
});
