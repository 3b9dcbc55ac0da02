import {
  createContext,
  useCallback,
  useContext,
  useEffect,
  useMemo,
  useRef,
  useState,
  type ReactNode,
} from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors, radius, spacing } from '@/src/theme';
import { AppText } from './app-text';

export type ToastKind = 'success' | 'error' | 'info';
export type ToastOptions = {
  kind?: ToastKind;
  /** e.g. { label: 'Undo', onPress: restore } — pressing it also closes the toast. */
  action?: { label: string; onPress: () => void };
  durationMs?: number;
};
type ToastItem = { id: number; message: string; kind: ToastKind; action?: ToastOptions['action'] };

const ToastContext = createContext<{ show(message: string, options?: ToastOptions): void } | null>(
  null,
);

/** Mutation results: one message at a time at the foot of the content, announced politely. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toast, setToast] = useState<ToastItem | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const seq = useRef(0);
  const insets = useSafeAreaInsets();

  const dismiss = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    setToast(null);
  }, []);

  const show = useCallback((message: string, options: ToastOptions = {}) => {
    if (timer.current) clearTimeout(timer.current);
    seq.current += 1;
    setToast({ id: seq.current, message, kind: options.kind ?? 'info', action: options.action });
    // Leave time to reach an Undo button.
    const ms = options.durationMs ?? (options.action ? 8000 : 4500);
    timer.current = setTimeout(() => setToast(null), ms);
  }, []);

  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
    },
    [],
  );

  const value = useMemo(() => ({ show }), [show]);
  return (
    <ToastContext.Provider value={value}>
      {children}
      {toast ? (
        <View style={[styles.layer, { bottom: insets.bottom + spacing.lg }]}>
          <View
            key={toast.id}
            style={[
              styles.toast,
              toast.kind === 'error' && styles.error,
              toast.kind === 'success' && styles.success,
            ]}
            accessibilityRole={toast.kind === 'error' ? 'alert' : 'text'}
            accessibilityLiveRegion="polite"
            testID="toast"
          >
            <AppText style={styles.message}>{toast.message}</AppText>
            {toast.action ? (
              <Pressable
                accessibilityRole="button"
                testID="toast-action"
                onPress={() => {
                  toast.action?.onPress();
                  dismiss();
                }}
                style={styles.action}
              >
                <AppText variant="label" style={styles.actionText}>
                  {toast.action.label}
                </AppText>
              </Pressable>
            ) : null}
            <Pressable
              accessibilityRole="button"
              accessibilityLabel="Dismiss message"
              onPress={dismiss}
              style={styles.action}
            >
              <AppText variant="label" style={styles.actionText}>
                Close
              </AppText>
            </Pressable>
          </View>
        </View>
      ) : null}
    </ToastContext.Provider>
  );
}

export function useToast() {
  const value = useContext(ToastContext);
  if (!value) throw new Error('useToast must be used inside <ToastProvider>');
  return value;
}

const styles = StyleSheet.create({
  layer: {
    position: 'absolute',
    left: 0,
    right: 0,
    alignItems: 'center',
    paddingHorizontal: spacing.lg,
    pointerEvents: 'box-none',
  },
  toast: {
    width: '100%',
    maxWidth: 560,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.sm,
    paddingLeft: spacing.lg,
    paddingRight: spacing.xs,
    paddingVertical: spacing.xs,
    borderRadius: radius.md,
    backgroundColor: colors.ink,
    borderLeftWidth: 6,
    borderLeftColor: colors.accentSoft,
  },
  error: { borderLeftColor: colors.danger },
  success: { borderLeftColor: colors.ok },
  message: { flex: 1, color: colors.accentInk, paddingVertical: spacing.sm },
  action: { minHeight: 44, minWidth: 44, paddingHorizontal: spacing.md, justifyContent: 'center' },
  actionText: { color: colors.focus },
});
