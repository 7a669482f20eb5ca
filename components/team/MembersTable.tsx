import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Badge, Button, Card, type Column, FormStatus, Select, Table, Text } from '@/components/ui';
import { useChangeRoleMutation, useSetMemberActiveMutation } from '@/lib/api/team';
import type { Member } from '@/lib/api/types';
import { breakableEmail } from '@/lib/format';
import { type Role, ROLE_LABELS } from '@/lib/roles';
import { space } from '@/lib/theme';

import { roleOptions } from './role-options';

/** Members with their role and status; the owner changes a role or deactivates someone from here. */
export function MembersTable({ members, currentUserId }: { members: Member[]; currentUserId: number }) {
  const [editing, setEditing] = useState<Member | null>(null);
  const setActive = useSetMemberActiveMutation();
  const columns: Column<Member>[] = [
    {
      key: 'name',
      header: 'Name',
      flex: 1.4,
      render: (m) => (
        <View>
          <Text>{m.id === currentUserId ? `${m.name} (you)` : m.name}</Text>
          <Text variant="small" aria-label={m.email}>
            {breakableEmail(m.email)}
          </Text>
        </View>
      ),
    },
    { key: 'role', header: 'Role', render: (m) => <Badge label={ROLE_LABELS[m.role]} tone="info" /> },
    {
      key: 'status',
      header: 'Status',
      render: (m) => <Badge label={m.active ? 'Active' : 'Deactivated'} tone={m.active ? 'success' : 'neutral'} />,
    },
    {
      key: 'actions',
      header: 'Actions',
      flex: 1.6,
      render: (m) => (
        <View style={styles.actions}>
          <Button
            label="Change role"
            accessibleName={`Change role of ${m.name}`}
            variant="secondary"
            onPress={() => setEditing(m)}
          />
          {m.id !== currentUserId ? (
            <Button
              label={m.active ? 'Deactivate' : 'Reactivate'}
              accessibleName={m.active ? `Deactivate ${m.name}` : `Reactivate ${m.name}`}
              variant={m.active ? 'quiet' : 'secondary'}
              busy={setActive.isPending && setActive.variables?.id === m.id}
              onPress={() => setActive.mutate({ id: m.id, active: !m.active })}
            />
          ) : null}
        </View>
      ),
    },
  ];
  return (
    <View style={styles.wrap}>
      <FormStatus error={setActive.error} />
      <Table label="Members" columns={columns} rows={members} rowKey={(m) => m.id} />
      {editing ? <RoleEditor key={editing.id} member={editing} onDone={() => setEditing(null)} /> : null}
    </View>
  );
}

function RoleEditor({ member, onDone }: { member: Member; onDone: () => void }) {
  const [role, setRole] = useState<Role>(member.role);
  const changeRole = useChangeRoleMutation();
  return (
    <Card title={`Role of ${member.name}`}>
      <FormStatus error={changeRole.error} />
      <Select label="New role" value={role} options={roleOptions} onChange={setRole} />
      <View style={styles.actions}>
        <Button
          label="Save role"
          busy={changeRole.isPending}
          disabled={role === member.role}
          onPress={() => changeRole.mutate({ id: member.id, role }, { onSuccess: onDone })}
        />
        <Button label="Cancel" variant="quiet" onPress={onDone} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
