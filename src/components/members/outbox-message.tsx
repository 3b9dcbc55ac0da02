import { router, type Href } from 'expo-router';
import { Linking, Pressable, StyleSheet, View } from 'react-native';
import type { OutboxMessage } from '@/shared/schemas';
import { AppText, Card } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';
import { formatMoment } from '@/src/format/dates';

/** Links to this app open in place (an invitation can be accepted right here); others in a new tab. */
function open(href: string) {
  const origin = globalThis.location?.origin;
  if (origin && href.startsWith(origin + '/')) router.push(href.slice(origin.length) as Href);
  else Linking.openURL(href);
}

/** One captured e-mail with its links. */
export function OutboxMessageCard({ message: m }: { message: OutboxMessage }) {
  return (
    <Card testID={`outbox-${m.id}`}>
      <AppText variant="label">{m.subject}</AppText>
      <AppText variant="caption" muted>
        To {m.to.join(', ')} · {formatMoment(m.receivedAt)}
      </AppText>
      <AppText selectable style={styles.text}>
        {m.text.trim()}
      </AppText>
      {m.links.length ? (
        <View style={styles.links}>
          {m.links.map((href) => (
            <Pressable
              key={href}
              accessibilityRole="link"
              onPress={() => open(href)}
              style={styles.link}
              testID="outbox-link"
            >
              <AppText style={styles.linkText}>{href}</AppText>
            </Pressable>
          ))}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  text: { paddingVertical: spacing.sm },
  links: { gap: spacing.xs },
  link: { minHeight: 44, justifyContent: 'center' },
  linkText: { color: colors.accent, textDecorationLine: 'underline' },
});
