import { router } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { ROLE_LABELS } from '@/shared/roles';
import { AppText } from '@/src/components/ui';
import { useSession } from '@/src/hooks/use-session';
import { colors, radius, spacing } from '@/src/theme';

/** Lists the caller's workshops when there are several; choosing one opens its vehicles. */
export function WorkshopSwitcher({ inverse }: { inverse?: boolean }) {
  const { memberships, active, setActiveWorkshop } = useSession();
  if (memberships.length < 2) return null;
  return (
    <View
      style={styles.list}
      accessibilityRole="radiogroup"
      accessibilityLabel="Workshop"
      testID="workshop-switcher"
    >
      <AppText variant="caption" style={inverse ? styles.inverseMuted : undefined} muted={!inverse}>
        Switch workshop
      </AppText>
      {memberships.map((m) => {
        const selected = m.workshopId === active?.workshopId;
        return (
          <Pressable
            key={m.workshopId}
            accessibilityRole="radio"
            accessibilityState={{ checked: selected }}
            accessibilityLabel={`${m.workshopName}, ${ROLE_LABELS[m.role]}`}
            testID={`workshop-${m.workshopId}`}
            onPress={() => {
              if (selected) return;
              setActiveWorkshop(m.workshopId);
              router.replace('/vehicles');
            }}
            style={[
              styles.row,
              inverse && styles.rowInverse,
              selected && (inverse ? styles.selectedInverse : styles.selected),
            ]}
          >
            <AppText
              variant="label"
              style={inverse ? styles.inverseInk : undefined}
              numberOfLines={1}
            >
              {m.workshopName}
            </AppText>
            <AppText
              variant="caption"
              style={inverse ? styles.inverseMuted : undefined}
              muted={!inverse}
            >
              {ROLE_LABELS[m.role]}
            </AppText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xs },
  row: {
    minHeight: 48,
    justifyContent: 'center',
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.xs,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  rowInverse: { borderColor: 'rgba(255,255,255,0.25)', backgroundColor: 'transparent' },
  selected: { borderColor: colors.accent, borderWidth: 2, backgroundColor: colors.accentSoft },
  selectedInverse: { borderColor: colors.focus, borderWidth: 2 },
  inverseInk: { color: colors.accentInk },
  inverseMuted: { color: '#C9D3D6' },
});
