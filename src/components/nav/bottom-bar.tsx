import { router } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { AppText } from '@/src/components/ui';
import { colors, fonts } from '@/src/theme';
import { NavIcon } from './nav-icon';
import type { NavItem, NavKey } from './nav-items';

const BAR_HEIGHT = 64;

/** Phone navigation: one row of labelled entries at the thumb's reach. */
export function BottomBar({ items, active }: { items: NavItem[]; active: NavKey | null }) {
  const insets = useSafeAreaInsets();
  return (
    <View
      style={[styles.bar, { paddingBottom: insets.bottom }]}
      accessibilityRole="tablist"
      accessibilityLabel="Main sections"
      testID="bottom-bar"
    >
      {items.map((item) => {
        const selected = item.key === active;
        const color = selected ? colors.accent : colors.inkMuted;
        return (
          <Pressable
            key={item.key}
            testID={`nav-${item.key}`}
            accessibilityRole="tab"
            accessibilityState={{ selected }}
            accessibilityLabel={item.label}
            onPress={() => router.navigate(item.href)}
            style={styles.item}
          >
            <View style={[styles.marker, selected && styles.markerOn]} />
            <NavIcon name={item.key} color={color} />
            <AppText
              variant="caption"
              style={[styles.label, { color }, selected && styles.labelOn]}
            >
              {item.label}
            </AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    borderTopWidth: 1,
    borderTopColor: colors.line,
    backgroundColor: colors.surface,
  },
  item: { flex: 1, height: BAR_HEIGHT, alignItems: 'center', justifyContent: 'center', gap: 2 },
  marker: { position: 'absolute', top: 0, height: 3, width: 36, borderRadius: 2 },
  markerOn: { backgroundColor: colors.accent },
  label: { fontSize: 13 },
  labelOn: { fontFamily: fonts.bold },
});
