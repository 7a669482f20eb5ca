import { StyleSheet, View } from 'react-native';

import { Badge, Button, type Column, EmptyState, FormStatus, Table, Text, type Tone } from '@/components/ui';
import { useResendInvitationMutation, useRevokeInvitationMutation } from '@/lib/api/team';
import type { Invitation, InvitationStatus } from '@/lib/api/types';
import { breakableEmail, formatDate } from '@/lib/format';
import { ROLE_LABELS } from '@/lib/roles';
import { space } from '@/lib/theme';

const STATUS: Record<InvitationStatus, { label: string; tone: Tone }> = {
  pending: { label: 'Waiting', tone: 'caution' },
  expired: { label: 'Expired', tone: 'neutral' },
  accepted: { label: 'Joined', tone: 'success' },
  revoked: { label: 'Withdrawn', tone: 'neutral' },
};

/** Open invitations: resend a fresh link (7 more days) or withdraw one. */
export function InvitationsTable({ invitations }: { invitations: Invitation[] }) {
  const resend = useResendInvitationMutation();
  const revoke = useRevokeInvitationMutation();
  if (invitations.length === 0) {
    return <EmptyState title="No open invitations" message="People you invite appear here until they join." />;
  }
  const columns: Column<Invitation>[] = [
    {
      key: 'email',
      header: 'E-mail',
      flex: 1.6,
      render: (i) => <Text aria-label={i.email}>{breakableEmail(i.email)}</Text>,
    },
    { key: 'role', header: 'Role', render: (i) => <Badge label={ROLE_LABELS[i.role]} tone="info" /> },
    {
      key: 'status',
      header: 'Status',
      render: (i) => (
        <View>
          <Badge label={STATUS[i.status].label} tone={STATUS[i.status].tone} />
          <Text variant="small">
            {i.status === 'expired' ? `ended ${formatDate(i.expiresAt)}` : `until ${formatDate(i.expiresAt)}`}
          </Text>
        </View>
      ),
    },
    {
      key: 'actions',
      header: 'Actions',
      flex: 1.4,
      render: (i) => (
        <View style={styles.actions}>
          <Button
            label="Resend"
            accessibleName={`Resend the invitation to ${i.email}`}
            variant="secondary"
            busy={resend.isPending && resend.variables === i.id}
            onPress={() => resend.mutate(i.id)}
          />
          <Button
            label="Withdraw"
            accessibleName={`Withdraw the invitation to ${i.email}`}
            variant="quiet"
            busy={revoke.isPending && revoke.variables === i.id}
            onPress={() => revoke.mutate(i.id)}
          />
        </View>
      ),
    },
  ];
  return (
    <View style={styles.wrap}>
      <FormStatus error={resend.error ?? revoke.error} />
      {resend.isSuccess ? <Text variant="small">A fresh link was sent to {resend.data.email}.</Text> : null}
      <Table label="Invitations" columns={columns} rows={invitations} rowKey={(i) => i.id} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
