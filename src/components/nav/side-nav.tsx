import { router } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { ROLE_LABELS } from '@/shared/roles';
import { AppText } from '@/src/components/ui';
import { useSession } from '@/src/hooks/use-session';
import { colors, radius, spacing } from '@/src/theme';
import { NavIcon } from './nav-icon';
import type { NavItem, NavKey } from './nav-items';
import { WorkshopSwitcher } from './workshop-switcher';

export const SIDE_NAV_WIDTH = 248;

/** Wide-screen navigation: the workshop first, then the same entries as the phone bar. */
export function SideNav({ items, active }: { items: NavItem[]; active: NavKey | null }) {
  const { active: membership, user } = useSession();
  return (
    <View style={styles.nav} role="navigation" testID="side-nav">
      <View style={styles.brand}>
        <AppText variant="caption" style={styles.product}>
          SOUNDFRAME
        </AppText>
        <AppText
          variant="title"
          style={styles.workshop}
          numberOfLines={2}
          testID="side-nav-workshop"
        >
          {membership?.workshopName}
        </AppText>
        {membership ? (
          <AppText variant="caption" style={styles.muted}>
            {user?.name} · {ROLE_LABELS[membership.role]}
          </AppText>
        ) : null}
      </View>
      <View style={styles.items}>
        {items.map((item) => {
          const selected = item.key === active;
          return (
            <Pressable
              key={item.key}
              testID={`side-nav-${item.key}`}
              accessibilityRole="link"
              accessibilityState={{ selected }}
              aria-current={selected ? 'page' : undefined}
              onPress={() => router.navigate(item.href)}
              style={({ pressed }) => [
                styles.item,
                selected && styles.itemOn,
                pressed && styles.itemPressed,
              ]}
            >
              <NavIcon name={item.key} color={selected ? colors.ink : colors.accentInk} />
              <AppText variant="label" style={[styles.itemLabel, selected && styles.itemLabelOn]}>
                {item.label}
              </AppText>
            </Pressable>
          );
        })}
      </View>
      <View style={styles.footer}>
        <WorkshopSwitcher inverse />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  nav: {
    width: SIDE_NAV_WIDTH,
    backgroundColor: colors.ink,
    paddingVertical: spacing.xl,
    paddingHorizontal: spacing.md,
    gap: spacing.xl,
  },
  brand: { gap: spacing.xs, paddingHorizontal: spacing.sm },
  product: { color: colors.timber, letterSpacing: 2, fontSize: 12 },
  workshop: { color: colors.accentInk },
  muted: { color: '#C9D3D6' },
  items: { gap: spacing.xs },
  item: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: 48,
    paddingHorizontal: spacing.md,
    borderRadius: radius.md,
  },
  itemOn: { backgroundColor: colors.paper },
  itemPressed: { opacity: 0.8 },
  itemLabel: { color: colors.accentInk, fontSize: 16 },
  itemLabelOn: { color: colors.ink },
  footer: { marginTop: 'auto' },
});
