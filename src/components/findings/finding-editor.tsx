import { useQueryClient } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { BodyPlan } from '@/shared/body-plans';
import { can, type Role } from '@/shared/roles';
import type { FindingResponse } from '@/shared/schemas';
import { cleanError } from '@/src/api/client';
import { findingQueries, useCreateFinding, useUpdateFinding } from '@/src/api/findings';
import { newId } from '@/src/api/ids';
import { AppText, Button, FIELDS_NEED_ATTENTION, saveFailure, useToast } from '@/src/components/ui';
import type { Units } from '@/src/components/wood/labels';
import type { ShopClimate } from '@/src/components/wood/moisture';
import { colors, radius, spacing } from '@/src/theme';
import { FindingForm } from './finding-form';
import { FindingPhotos } from './finding-photos';
import {
  defaultSpecies,
  emptyValues,
  errorFieldNames,
  errorsAfterChange,
  validateCreate,
  validateUpdate,
  valuesFromFinding,
  type FindingFieldErrors,
  type FindingFormValues,
  type Pin,
} from './form-values';
import { useFindingRemoval } from './use-finding-removal';
import { usePhotoQueue } from './use-photo-queue';

export type FindingEditorMode =
  | { kind: 'new'; surveyId: string; zoneKey: string; pin: Pin }
  | { kind: 'edit'; finding: FindingResponse };

type Props = {
  wid: string;
  plan: BodyPlan;
  role: Role;
  mode: FindingEditorMode;
  /** Saved (and every photo uploaded), or the user chose Done: leave the form. */
  onDone(finding: FindingResponse): void;
  onDeleted?(finding: FindingResponse): void;
  /** The survey's shop climate, for the moisture panel (null: none recorded or not known). */
  climate?: ShopClimate | null;
  units?: Units;
};

/**
 * Log or edit one finding. A new finding is saved first and its photos uploaded after, one by
 * one, so a failed photo can be retried without losing (or duplicating) the finding.
 */
export function FindingEditor({
  wid,
  plan,
  role,
  mode,
  onDone,
  onDeleted,
  climate = null,
  units = 'metric',
}: Props) {
  const queryClient = useQueryClient();
  const toast = useToast();
  const startZone = mode.kind === 'new' ? mode.zoneKey : mode.finding.zoneKey;
  const startPin = mode.kind === 'new' ? mode.pin : mode.finding.pin;
  const [saved, setSaved] = useState<FindingResponse | null>(
    mode.kind === 'edit' ? mode.finding : null,
  );
  const [values, setValues] = useState<FindingFormValues>(() =>
    mode.kind === 'edit'
      ? valuesFromFinding(mode.finding)
      : emptyValues(startZone, defaultSpecies(plan, startZone)),
  );
  const [baseline, setBaseline] = useState(values);
  const [errors, setErrors] = useState<FindingFieldErrors>({});
  const [conflict, setConflict] = useState(false);
  const [busy, setBusy] = useState(false);
  // One id per form, kept across retries, so a repeated create is still one finding.
  const [formId] = useState(newId);

  const create = useCreateFinding(wid, mode.kind === 'new' ? mode.surveyId : mode.finding.surveyId);
  const update = useUpdateFinding(wid, saved?.id ?? formId);
  const queue = usePhotoQueue(wid);
  const removal = useFindingRemoval({
    wid,
    finding: saved,
    onPhotoRemoved: (id) =>
      setSaved((f) => f && { ...f, photos: f.photos.filter((p) => p.id !== id) }),
    onFindingRemoved: onDeleted,
  });

  // A pin belongs to the zone it was tapped in; moving the finding to another zone drops it.
  const pin = values.zoneKey === startZone ? startPin : null;
  const dirty = useMemo(
    () => JSON.stringify(values) !== JSON.stringify(baseline),
    [values, baseline],
  );

  const change = (patch: Partial<FindingFormValues>) => {
    setValues((v) => {
      const next = { ...v, ...patch };
      // The meter's species follows the zone until the inspector picks one.
      if (patch.zoneKey && v.species === defaultSpecies(plan, v.zoneKey))
        next.species = defaultSpecies(plan, patch.zoneKey);
      return next;
    });
    setErrors((e) => errorsAfterChange(e, patch));
  };

  function failed(e: unknown) {
    const f = saveFailure(e);
    if (f.conflict) return setConflict(true);
    if (f.message === null) setErrors(f.fields);
    toast.show(f.message ?? FIELDS_NEED_ATTENTION, { kind: 'error' });
  }

  async function save() {
    setBusy(true);
    try {
      let finding = saved;
      if (!finding) {
        const v = validateCreate(values, pin, formId);
        if (!v.ok) return setErrors(v.errors);
        finding = await create.mutateAsync(v.body);
      } else if (dirty) {
        const v = validateUpdate(values, pin, finding.version);
        if (!v.ok) return setErrors(v.errors);
        finding = await update.mutateAsync(v.body);
      }
      setSaved(finding);
      setBaseline(values);
      setErrors({});
      if (await queue.uploadAll(finding.id)) {
        toast.show(mode.kind === 'new' ? 'Finding logged' : 'Finding saved', { kind: 'success' });
        onDone(finding);
      } else
        toast.show('The finding is saved, but some photos did not upload. See them below.', {
          kind: 'error',
        });
    } catch (e) {
      failed(e);
    } finally {
      setBusy(false);
    }
  }

  async function reload() {
    if (!saved) return;
    try {
      const fresh = await queryClient.fetchQuery({
        ...findingQueries.detail(wid, saved.id),
        staleTime: 0,
      });
      const next = valuesFromFinding(fresh);
      setSaved(fresh);
      setValues(next);
      setBaseline(next);
      setConflict(false);
    } catch (e) {
      toast.show(cleanError(e), { kind: 'error' });
    }
  }

  const errorNames = errorFieldNames(errors);
  const photoTrouble = queue.items.some((p) => p.status === 'failed' || p.status === 'rejected');

  return (
    <View style={styles.wrap}>
      {conflict ? (
        <View
          style={[styles.banner, styles.bannerDanger]}
          accessibilityRole="alert"
          testID="finding-conflict"
        >
          <AppText>
            Someone else changed this finding while you were editing. Reload to see their changes,
            then make yours again.
          </AppText>
          <Button
            label="Reload the finding"
            variant="secondary"
            onPress={reload}
            testID="finding-reload"
          />
        </View>
      ) : null}
      {mode.kind === 'new' && saved ? (
        <View style={styles.banner} testID="finding-saved-banner">
          <AppText>
            The finding is saved. Photos that did not upload are listed with it below.
          </AppText>
        </View>
      ) : null}

      <FindingForm
        plan={plan}
        values={values}
        onChange={change}
        errors={errors}
        climate={climate}
        units={units}
        photos={
          <FindingPhotos
            saved={saved}
            queue={queue}
            canAdd={can(role, 'photos.write')}
            busy={busy}
            onRemoveStored={removal.askPhoto}
          />
        }
      />

      <View style={styles.footer}>
        {errorNames.length ? (
          <AppText
            style={styles.errorSummary}
            accessibilityRole="alert"
            testID="finding-error-summary"
          >
            Check {errorNames.join(', ')}.
          </AppText>
        ) : null}
        <View style={styles.actions}>
          <Button
            label={saved ? 'Save changes' : 'Save finding'}
            onPress={save}
            loading={busy}
            disabled={!!saved && !dirty && !queue.pending}
            testID="finding-save"
          />
          {saved && (photoTrouble || mode.kind === 'new') ? (
            <Button
              label="Done"
              variant="secondary"
              onPress={() => onDone(saved)}
              testID="finding-done"
            />
          ) : null}
          {saved && can(role, 'findings.write') ? (
            <Button
              label="Remove finding"
              variant="ghost"
              onPress={removal.askFinding}
              testID="finding-delete"
            />
          ) : null}
        </View>
      </View>
      {removal.dialog}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xl },
  banner: {
    gap: spacing.sm,
    padding: spacing.lg,
    borderRadius: radius.md,
    backgroundColor: colors.accentSoft,
    borderLeftWidth: 6,
    borderLeftColor: colors.accent,
  },
  bannerDanger: { backgroundColor: colors.dangerSoft, borderLeftColor: colors.danger },
  footer: {
    gap: spacing.md,
    paddingTop: spacing.lg,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
  errorSummary: { color: colors.danger, fontWeight: 'bold' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
