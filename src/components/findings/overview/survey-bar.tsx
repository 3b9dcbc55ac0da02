import { ScrollView, StyleSheet, View } from 'react-native';
import type { SurveyPurpose, SurveyResponse } from '@/shared/schemas';
import { AppText, Button, ChipToggle } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { formatDay } from '@/src/format/dates';

export const SURVEY_PURPOSE_SHORT: Record<SurveyPurpose, string> = {
  baseline: 'Baseline',
  'pre-purchase': 'Pre-purchase',
  'post-treatment': 'After treatment',
  progress: 'Progress',
};

/** Newest first: by survey date, then by when it was recorded. */
export function sortSurveys(surveys: SurveyResponse[]): SurveyResponse[] {
  return [...surveys].sort(
    (a, b) => b.date.localeCompare(a.date) || b.createdAt.localeCompare(a.createdAt),
  );
}

/** Which survey the diagram shows ('all' = every open finding), and a way to start the next one. */
export function SurveyBar({
  surveys,
  value,
  onChange,
  onStart,
}: {
  surveys: SurveyResponse[];
  value: string;
  onChange(surveyId: string): void;
  /** Absent for roles that may not start surveys. */
  onStart?: () => void;
}) {
  return (
    <View style={styles.wrap}>
      <View style={styles.head}>
        <AppText variant="label">Show findings from</AppText>
        {onStart ? (
          <Button
            label="Start a survey"
            variant="secondary"
            compact
            onPress={onStart}
            testID="survey-start"
          />
        ) : null}
      </View>
      {surveys.length ? (
        <ScrollView
          horizontal
          showsHorizontalScrollIndicator={false}
          contentContainerStyle={styles.chips}
        >
          <ChipToggle
            label="All surveys"
            checked={value === 'all'}
            onChange={() => onChange('all')}
            testID="survey-all"
          />
          {surveys.map((s) => (
            <ChipToggle
              key={s.id}
              label={`${formatDay(s.date)} · ${SURVEY_PURPOSE_SHORT[s.purpose]}`}
              checked={value === s.id}
              onChange={() => onChange(s.id)}
              testID={'survey-' + s.id}
            />
          ))}
        </ScrollView>
      ) : (
        <AppText muted testID="no-surveys">
          No survey yet. Start one to log findings.
        </AppText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  head: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    flexWrap: 'wrap',
    gap: spacing.sm,
  },
  chips: { gap: spacing.sm, paddingVertical: 2 },
});
