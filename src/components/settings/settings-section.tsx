import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

/** One titled part of the owner's settings form: the shared form section. */
export { FormSection as Section } from '@/src/components/ui';

/** A field in a wrapping grid of fields. */
export function Cell({ children }: { children: ReactNode }) {
  return <View style={styles.cell}>{children}</View>;
}

const styles = StyleSheet.create({
  cell: { flexGrow: 1, flexBasis: 200, minWidth: 0 },
});
