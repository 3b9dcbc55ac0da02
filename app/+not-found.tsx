import { router } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { AppText, Button } from '@/src/components/ui';
import { colors, spacing } from '@/src/theme';

export default function NotFound() {
  return (
    <View style={styles.page}>
      <AppText variant="heading" accessibilityRole="header">
        Nothing at this address
      </AppText>
      <AppText muted>The link may be mistyped, or the page has moved.</AppText>
      <Button label="Go to vehicles" onPress={() => router.replace('/vehicles')} />
    </View>
  );
}

const styles = StyleSheet.create({
  page: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.lg,
    padding: spacing.xl,
    backgroundColor: colors.paper,
  },
});
