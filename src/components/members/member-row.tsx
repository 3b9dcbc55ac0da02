import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ROLE_LABELS, type Role } from '@/shared/roles';
import type { MemberResponse } from '@/shared/schemas';
import { AppText, Badge, Button, Card, Select } from '@/src/components/ui';
import { spacing } from '@/src/theme';
import { ROLE_OPTIONS } from './role-options';

type Props = {
  member: MemberResponse;
  isSelf: boolean;
  /** Owners get role and removal controls (never on their own row). */
  canManage: boolean;
  onChangeRole: (role: Role) => void;
  onRemove: () => void;
  changing?: boolean;
};

export function MemberRow({
  member: m,
  isSelf,
  canManage,
  onChangeRole,
  onRemove,
  changing,
}: Props) {
  const [editing, setEditing] = useState(false);
  const manage = canManage && !isSelf;
  return (
    <Card testID={`member-${m.id}`}>
      <View style={styles.top}>
        <View style={styles.names}>
          <AppText variant="label">
            {m.name}
            {isSelf ? ' (you)' : ''}
          </AppText>
          <AppText variant="caption" muted>
            {m.email}
          </AppText>
        </View>
        <Badge label={ROLE_LABELS[m.role]} tone={m.role === 'owner' ? 'accent' : 'neutral'} />
      </View>
      {manage ? (
        <View style={styles.actions}>
          <Button
            label={editing ? 'Done' : 'Change role'}
            variant="secondary"
            compact
            onPress={() => setEditing((e) => !e)}
            accessibilityLabel={editing ? 'Done changing role' : `Change role of ${m.name}`}
            testID={`member-${m.id}-change-role`}
          />
          <Button
            label="Remove"
            variant="ghost"
            compact
            onPress={onRemove}
            accessibilityLabel={`Remove ${m.name} from the workshop`}
            testID={`member-${m.id}-remove`}
          />
        </View>
      ) : null}
      {manage && editing ? (
        <Select
          label={`Role of ${m.name}`}
          options={ROLE_OPTIONS}
          value={m.role}
          onChange={(role) => {
            if (role !== m.role && !changing) onChangeRole(role);
          }}
          testID={`member-${m.id}-role`}
        />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  top: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    justifyContent: 'space-between',
    gap: spacing.md,
  },
  names: { flex: 1, gap: 2 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
