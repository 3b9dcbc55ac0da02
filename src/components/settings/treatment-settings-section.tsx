import { StyleSheet, View } from 'react-native';
import { PLAN_GROUP_LABELS, PLAN_GROUPS } from '@/shared/treatments';
import { AppText, TextField } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { Cell, Section } from './settings-section';
import { planError, type SettingsErrors, type SettingsFormValues } from './settings-values';

const CLEARANCE = 'settings.treatments.clearance';
const whole = { keyboardType: 'number-pad' as const, inputMode: 'numeric' as const };

type Props = {
  values: SettingsFormValues;
  onChange(patch: Partial<SettingsFormValues>): void;
  errors: SettingsErrors;
};

/** Region and local rules, when a treatment counts as cleared, and the re-check plans. */
export function TreatmentSettingsSection({ values, onChange, errors }: Props) {
  return (
    <Section title="Treatments and re-checks" testID="settings-treatments">
      <TextField
        label="Region"
        hint="Where the workshop works; reports use it for notes on local rules."
        value={values.region}
        onChangeText={(region) => onChange({ region })}
        error={errors['settings.region']}
        testID="settings-region"
      />
      <TextField
        label="Local regulatory notes"
        hint="Shown beside the cautions in every treatment form: licences, permitted products, notice periods. The product label and local codes still decide."
        multiline
        value={values.regulatoryNotes}
        onChangeText={(regulatoryNotes) => onChange({ regulatoryNotes })}
        error={errors['settings.treatments.regulatoryNotes']}
        testID="settings-regulatory-notes"
      />
      <TextField
        label="Workshop time zone"
        hint="An IANA name such as Europe/Berlin; re-check due dates are calendar days there."
        autoCapitalize="none"
        autoCorrect={false}
        value={values.timeZone}
        onChangeText={(timeZone) => onChange({ timeZone })}
        error={errors['settings.treatments.timeZone']}
        testID="settings-time-zone"
      />

      <AppText variant="label">When a treatment counts as cleared</AppText>
      <AppText muted>
        Common practice defaults, yours to change. They are rules of thumb of the trade, not
        published rules.
      </AppText>
      <View style={styles.grid}>
        <Cell>
          <TextField
            label="Clean re-checks in a row"
            value={values.cleanChecksRequired}
            onChangeText={(cleanChecksRequired) => onChange({ cleanChecksRequired })}
            error={errors[`${CLEARANCE}.cleanChecksRequired`]}
            testID="settings-clean-checks"
            {...whole}
          />
        </Cell>
        <Cell>
          <TextField
            label="Spanning at least"
            suffix="days"
            value={values.minSpanDays}
            onChangeText={(minSpanDays) => onChange({ minSpanDays })}
            error={errors[`${CLEARANCE}.minSpanDays`]}
            testID="settings-min-span"
            {...whole}
          />
        </Cell>
      </View>

      <AppText variant="label">Re-check plans</AppText>
      <AppText muted>
        Days after the treatment date, in increasing order and separated by commas, e.g. 14, 42, 90.
      </AppText>
      {PLAN_GROUPS.map((g) => (
        <TextField
          key={g}
          label={PLAN_GROUP_LABELS[g]}
          value={values.plans[g]}
          onChangeText={(v) => onChange({ plans: { ...values.plans, [g]: v } })}
          error={planError(errors, g)}
          testID={`settings-plan-${g}`}
        />
      ))}
    </Section>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
