import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { shortIdParam } from '@/shared/schemas/report';
import { cleanError } from '@/src/api/client';
import { useVerify } from '@/src/api/public';
import { PublicFrame } from '@/src/components/reports/public-frame';
import { VerifyFilePicker } from '@/src/components/reports/verify-file-picker';
import { VerifyResult } from '@/src/components/reports/verify-result';
import { AppText, Button, Card, FormMessage, TextField } from '@/src/components/ui';

/** Anyone can check a Soundframe report: by its printed identifier, or by the PDF file itself. */
export default function VerifyScreen() {
  const params = useLocalSearchParams<{ id?: string }>();
  const verify = useVerify();
  const [shortId, setShortId] = useState(params.id ?? '');
  const [idError, setIdError] = useState<string | null>(null);
  const [fileName, setFileName] = useState<string | null>(null);

  function checkId() {
    const parsed = shortIdParam.safeParse(shortId);
    if (!parsed.success) return setIdError(parsed.error.issues[0].message);
    setIdError(null);
    setFileName(null);
    verify.mutate({ shortId: parsed.data });
  }

  return (
    <PublicFrame testID="verify-screen">
      <AppText variant="heading" accessibilityRole="header">
        Check a report
      </AppText>
      <AppText muted>
        Every Soundframe report carries an identifier such as SF-7K3M-Q9TD on each page. Enter it to
        see which report it is, or drop the PDF to learn whether the file is exactly the one the
        workshop issued. Nothing else of the workshop is shown.
      </AppText>
      <Card>
        <TextField
          label="Report identifier"
          placeholder="SF-XXXX-XXXX"
          autoCapitalize="characters"
          autoCorrect={false}
          value={shortId}
          onChangeText={setShortId}
          onSubmitEditing={checkId}
          error={idError}
          testID="verify-id"
        />
        <View style={styles.actions}>
          <Button
            label="Check the identifier"
            onPress={checkId}
            loading={verify.isPending && !fileName}
            testID="verify-id-submit"
          />
        </View>
      </Card>
      <Card>
        <AppText variant="label">Or check the file</AppText>
        <VerifyFilePicker
          disabled={verify.isPending}
          onFile={(file, name) => {
            setFileName(name);
            setIdError(null);
            verify.mutate({ file });
          }}
        />
        {fileName ? (
          <AppText variant="caption" testID="verify-file-name">
            {verify.isPending ? 'Checking' : 'Checked'} {fileName}
          </AppText>
        ) : null}
      </Card>
      <FormMessage
        message={verify.isError ? cleanError(verify.error) : null}
        testID="verify-error"
      />
      {verify.data && !verify.isPending ? (
        <VerifyResult result={verify.data} checkedBy={fileName ? 'file' : 'id'} />
      ) : null}
    </PublicFrame>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', justifyContent: 'flex-end' },
});
