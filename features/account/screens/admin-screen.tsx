import { StyleSheet, Text, View } from 'react-native';
import useSWR from 'swr';
import { roles, type AuditEntry, type Role, type User } from '../../../shared/schemas/users';
import { colors, fonts, radius, ScreenFrame, space, ToggleChip } from '../../ui';
import { changeRole } from '../api/account-api';
import { RequireRole } from '../components/require-role';
import { useMe } from '../hooks/use-me';

function RolesPanel() {
  const { user: me } = useMe();
  const users = useSWR<{ users: User[] }>('/api/admin/users');
  const audit = useSWR<{ entries: AuditEntry[] }>('/api/admin/audit');
  const set = async (u: User, role: Role) => {
    await changeRole(u.id, role, 'changed on the roles screen');
    await Promise.all([users.mutate(), audit.mutate()]);
  };
  return (
    <View style={styles.body}>
      <Text style={styles.lede}>New accounts start as members. Every change is logged below with who made it.</Text>
      {users.data?.users.map((u) => (
        <View key={u.id} style={styles.row} testID={`user-row-${u.login}`}>
          <View style={styles.who}>
            <Text style={styles.name}>{u.displayName}</Text>
            <Text style={styles.meta}>
              {u.login}
              {u.email ? ` · ${u.email}` : ''}
            </Text>
          </View>
          <View style={styles.chips}>
            {roles
              .filter((r) => r !== 'visitor')
              .map((r) => (
                <ToggleChip key={r} label={r} selected={u.role === r} onPress={() => void set(u, r)} disabled={u.id === me?.id} testID={`role-${u.login}-${r}`} />
              ))}
          </View>
        </View>
      ))}
      <Text style={styles.h2}>Changes</Text>
      <View testID="audit-log">
        {audit.data?.entries.map((e) => (
          <Text key={e.id} style={styles.meta}>
            {e.at} · {e.actor ?? 'system'} made {e.target} {e.newRole} (was {e.oldRole}){e.reason ? ` — ${e.reason}` : ''}
          </Text>
        ))}
      </View>
    </View>
  );
}

export function AdminScreen() {
  return (
    <ScreenFrame testID="admin-screen">
      <Text style={styles.h1} accessibilityRole="header">
        Roles
      </Text>
      <RequireRole role="admin">
        <RolesPanel />
      </RequireRole>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  h1: { fontFamily: fonts.bold, fontSize: 26, color: colors.ink },
  h2: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink, marginTop: space.lg },
  body: { gap: space.sm },
  lede: { fontFamily: fonts.regular, fontSize: 14, color: colors.inkSoft },
  row: { backgroundColor: colors.card, borderColor: colors.rule, borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.sm },
  who: { gap: 2 },
  name: { fontFamily: fonts.semibold, fontSize: 15, color: colors.ink },
  meta: { fontFamily: fonts.regular, fontSize: 13, color: colors.inkSoft },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
