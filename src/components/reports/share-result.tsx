import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { CreateShareResponse } from '@/shared/schemas/report';
import { AppText, Button } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';
import { copyText } from './copy-text';
import { formatDay } from '@/src/format/dates';

/** The new link (shown only now: the server keeps its hash), with Copy and the e-mail outcome. */
export function ShareResult({ share, onDone }: { share: CreateShareResponse; onDone: () => void }) {
  const [copied, setCopied] = useState<boolean | null>(null);
  return (
    <View style={styles.box} accessibilityLiveRegion="polite" testID="share-result">
      <AppText variant="label">Link made, open until {formatDay(share.expiresAt)}</AppText>
      <AppText selectable style={styles.link} testID="share-link">
        {share.url}
      </AppText>
      <AppText testID="share-emailed">
        {share.recipientEmail
          ? share.emailedAt
            ? `E-mailed to ${share.recipientEmail}.`
            : `The e-mail to ${share.recipientEmail} could not be sent; pass the link on yourself.`
          : 'No e-mail was sent; pass the link on yourself.'}
      </AppText>
      {copied === false ? (
        <AppText variant="caption" testID="share-copy-fallback">
          Copying is not allowed here: the link is selected, copy it with your keyboard.
        </AppText>
      ) : null}
      <View style={styles.actions}>
        <Button
          label={copied ? 'Copied' : 'Copy link'}
          compact
          onPress={async () => setCopied(await copyText(share.url, 'share-link'))}
          testID="share-copy"
        />
        <Button label="Done" variant="ghost" compact onPress={onDone} testID="share-done" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radius.md,
    borderWidth: 2,
    borderColor: colors.ok,
    backgroundColor: colors.okSoft,
  },
  link: { fontFamily: 'monospace', color: colors.ink },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
