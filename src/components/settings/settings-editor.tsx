import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { WorkshopSettings } from '@/shared/schemas';
import { ApiRequestError, cleanError } from '@/src/api/client';
import { useUpdateWorkshop } from '@/src/api/workshops';
import { AppText, Button, FieldErrorsNotice, FormMessage, useToast } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import { SettingsForm } from './settings-form';
import {
  buildSettings,
  valuesFromSettings,
  withWoodDefaults,
  type SettingsErrors,
  type SettingsFormValues,
} from './settings-values';

/** The owner's settings form: validated with the shared schema, saved as one PATCH. */
export function SettingsEditor({ wid, settings }: { wid: string; settings: WorkshopSettings }) {
  const toast = useToast();
  const update = useUpdateWorkshop(wid);
  const [values, setValues] = useState(() => valuesFromSettings(settings));
  const [baseline, setBaseline] = useState(values);
  const [errors, setErrors] = useState<SettingsErrors>({});
  const [message, setMessage] = useState<string | null>(null);
  const dirty = JSON.stringify(values) !== JSON.stringify(baseline);

  function change(patch: Partial<SettingsFormValues>) {
    setValues((v) => ({ ...v, ...patch }));
    setMessage(null);
  }

  async function save() {
    const built = buildSettings(values);
    setErrors(built.errors);
    if (!built.settings) return;
    try {
      const saved = await update.mutateAsync({ settings: built.settings });
      const next = valuesFromSettings(saved.settings);
      setValues(next);
      setBaseline(next);
      toast.show('Settings saved', { kind: 'success' });
    } catch (e) {
      if (e instanceof ApiRequestError && e.status === 400 && e.fields) setErrors(e.fields);
      else setMessage(cleanError(e));
    }
  }

  return (
    <View style={styles.wrap}>
      <SettingsForm values={values} onChange={change} errors={errors} />
      <View style={styles.footer}>
        <FieldErrorsNotice errors={errors} />
        <FormMessage message={message} testID="settings-message" />
        <View style={styles.actions}>
          <Button
            label="Save settings"
            onPress={save}
            loading={update.isPending}
            disabled={!dirty}
            testID="settings-save"
          />
          <Button
            label="Put back the common practice defaults"
            variant="secondary"
            onPress={() => change(withWoodDefaults(values))}
            testID="settings-defaults"
          />
        </View>
        <AppText variant="caption" muted>
          The defaults change the thresholds, slope, hours, prices and waste in this form; nothing
          is saved until you press Save. Saved decisions keep the figures they were made with.
        </AppText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xl },
  footer: {
    gap: spacing.md,
    paddingTop: spacing.lg,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
