import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Zone } from '@/shared/body-plans';
import { SURVEY_PURPOSES, type SurveyPurpose } from '@/shared/schemas';
import type { FieldErrors } from '@/src/components/ui';
import {
  AppText,
  Button,
  FieldErrorsNotice,
  FormMessage,
  Select,
  TextField,
} from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { ZoneMultiPicker } from './zone-multi-picker';
import { todayLocal } from '@/src/format/dates';

const PURPOSES: Record<SurveyPurpose, { label: string; description: string }> = {
  baseline: {
    label: 'First full survey',
    description: 'Every member that can be reached, before any work starts.',
  },
  'pre-purchase': {
    label: 'Before purchase',
    description: 'Condition as found for a buyer, with what could not be seen.',
  },
  'post-treatment': {
    label: 'After treatment',
    description: 'Treated zones checked again for fresh evidence.',
  },
  progress: { label: 'Progress visit', description: 'A look during repair or between re-checks.' },
};
export const PURPOSE_OPTIONS = SURVEY_PURPOSES.map((value) => ({ value, ...PURPOSES[value] }));

/** '' → null (not measured); a comma decimal is accepted; anything else stays NaN for the schema to refuse. */
function toNumber(text: string): number | null {
  const t = text.trim().replace(',', '.');
  return t === '' ? null : Number(t);
}

type Props = {
  zones: readonly Zone[];
  onSubmit: (body: Record<string, unknown>) => void;
  onCancel: () => void;
  errors: FieldErrors;
  message: string | null;
  busy: boolean;
};

export function SurveyForm({ zones, onSubmit, onCancel, errors, message, busy }: Props) {
  const [date, setDate] = useState(() => todayLocal());
  const [purpose, setPurpose] = useState<SurveyPurpose>('baseline');
  const [airTemp, setAirTemp] = useState('');
  const [humidity, setHumidity] = useState('');
  const [hidden, setHidden] = useState<string[]>([]);
  const [hiddenNotes, setHiddenNotes] = useState('');
  const [notes, setNotes] = useState('');
  const numberError = (key: string, text: string) =>
    errors[key] && Number.isNaN(toNumber(text) ?? 0) ? 'Enter a number' : errors[key];

  const submit = () =>
    onSubmit({
      date: date.trim(),
      purpose,
      airTempC: toNumber(airTemp),
      relativeHumidity: toNumber(humidity),
      notAccessibleZones: hidden,
      notAccessibleNotes: hiddenNotes,
      notes,
    });

  return (
    <View style={styles.form} testID="survey-form">
      <FormMessage message={message} />
      <TextField
        label="Date"
        hint="Year-month-day, e.g. 2025-04-17"
        value={date}
        onChangeText={setDate}
        error={errors.date ? 'Enter the date as year-month-day' : undefined}
        inputMode="numeric"
        maxLength={10}
        testID="survey-date"
      />
      <Select
        label="Purpose"
        options={PURPOSE_OPTIONS}
        value={purpose}
        onChange={setPurpose}
        testID="survey-purpose"
      />
      <View style={styles.row}>
        <View style={styles.grow}>
          <TextField
            label="Shop air temperature"
            value={airTemp}
            onChangeText={setAirTemp}
            error={numberError('airTempC', airTemp)}
            suffix="°C"
            inputMode="decimal"
            testID="survey-air-temp"
          />
        </View>
        <View style={styles.grow}>
          <TextField
            label="Relative humidity"
            value={humidity}
            onChangeText={setHumidity}
            error={numberError('relativeHumidity', humidity)}
            suffix="%"
            inputMode="decimal"
            testID="survey-humidity"
          />
        </View>
      </View>
      <AppText variant="caption" muted>
        Air readings let Soundframe tell a damp climate from a water source when moisture is high.
      </AppText>
      <View style={styles.group}>
        <AppText variant="label">Areas not accessible</AppText>
        <AppText variant="caption" muted>
          Members that could not be seen or probed on this visit; the report lists them as not
          inspected.
        </AppText>
        <ZoneMultiPicker zones={zones} value={hidden} onChange={setHidden} />
        <TextField
          label="Other areas, in words"
          hint="e.g. behind the fixed rear trim panel"
          value={hiddenNotes}
          onChangeText={setHiddenNotes}
          error={errors.notAccessibleNotes}
          multiline
          testID="survey-hidden-notes"
        />
      </View>
      <TextField
        label="Notes"
        value={notes}
        onChangeText={setNotes}
        error={errors.notes}
        multiline
        testID="survey-notes"
      />
      <FieldErrorsNotice errors={errors} />
      <View style={styles.actions}>
        <Button label="Cancel" variant="secondary" onPress={onCancel} />
        <Button label="Start survey" onPress={submit} loading={busy} testID="survey-submit" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  grow: { flexGrow: 1, flexBasis: 160 },
  group: { gap: spacing.sm },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', flexWrap: 'wrap', gap: spacing.sm },
});
