import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { createShareRequest, type CreateShareResponse } from '@/shared/schemas/report';
import { useCreateShare } from '@/src/api/reports';
import {
  AppText,
  Button,
  Card,
  EmailField,
  FormMessage,
  TextField,
  useFormSubmit,
} from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import { ShareResult } from './share-result';

const DAYS = 'Whole days, from 1 to 90';
/** The shared request, with plain words when the days field is not a whole number. */
const shareForm = createShareRequest.extend({
  expiresInDays: z
    .number({ error: DAYS })
    .int(DAYS)
    .min(1, 'At least one day')
    .max(90, 'At most 90 days'),
});

/** Make a link to one report, e-mailed when an address is given; the link is shown once. */
export function ShareForm({ wid, reportId }: { wid: string; reportId: string }) {
  const create = useCreateShare(wid, reportId);
  const [email, setEmail] = useState('');
  const [days, setDays] = useState('14');
  const [message, setMessage] = useState('');
  const [made, setMade] = useState<CreateShareResponse | null>(null);
  const form = useFormSubmit(shareForm, async (body) => {
    setMade(await create.mutateAsync(body));
    setEmail('');
    setMessage('');
  });

  return (
    <Card testID="share-form">
      <AppText variant="title" accessibilityRole="header">
        Share this report
      </AppText>
      <AppText style={styles.note} testID="share-note">
        Anyone with the link can read this report and download its PDF until the link expires or you
        withdraw it. They see nothing else of the workshop.
      </AppText>
      {made ? <ShareResult share={made} onDone={() => setMade(null)} /> : null}
      <FormMessage message={form.message} testID="share-form-message" />
      <EmailField
        label="Recipient's e-mail (optional)"
        hint="Leave empty to make a link you pass on yourself."
        value={email}
        onChangeText={setEmail}
        error={form.errors.recipientEmail}
        testID="share-email"
      />
      <TextField
        label="Link works for"
        suffix="days"
        hint="From 1 to 90 days."
        value={days}
        onChangeText={setDays}
        error={form.errors.expiresInDays}
        keyboardType="number-pad"
        inputMode="numeric"
        testID="share-days"
      />
      <TextField
        label="Message (optional)"
        hint="Sent with the e-mail."
        value={message}
        onChangeText={setMessage}
        error={form.errors.message}
        multiline
        testID="share-message"
      />
      <View style={styles.actions}>
        <Button
          label={email.trim() ? 'Send the link' : 'Make a link'}
          loading={form.busy}
          onPress={() =>
            form.submit({
              recipientEmail: email.trim() || null,
              expiresInDays: /^\d+$/.test(days.trim()) ? Number(days.trim()) : NaN,
              message,
            })
          }
          testID="share-submit"
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  note: {
    padding: spacing.md,
    borderLeftWidth: 4,
    borderLeftColor: colors.caution,
    backgroundColor: colors.cautionSoft,
  },
  actions: { flexDirection: 'row', justifyContent: 'flex-end' },
});
