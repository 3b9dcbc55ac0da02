import { StyleSheet, View } from 'react-native';
import { AppText } from '@/src/components/ui';
import { colors, radius, spacing } from '@/src/theme';

/** Shown wherever a verdict is: what the numbers are not, and the dust from the work. */
export function StructuralCaution() {
  return (
    <View style={styles.box} testID="structural-caution" role="note">
      <AppText variant="label">Before you cut</AppText>
      <AppText>
        Soundframe&apos;s verdicts are estimates from a visual survey and your measurements. A frame
        that carries doors, hinges, seats and belt mountings is structural: defer to a qualified
        restorer and to local roadworthiness rules.
      </AppText>
      <AppText>
        Cutting or sanding decayed, mouldy or treated wood raises harmful dust: use dust extraction
        or wet methods and respiratory protection, and dispose of treated offcuts as local rules
        say.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.sm,
    padding: spacing.lg,
    borderRadius: radius.md,
    borderLeftWidth: 6,
    borderLeftColor: colors.caution,
    backgroundColor: colors.cautionSoft,
  },
});
