import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { BrewerySettingsForm } from '@/components/team/BrewerySettingsForm';
import { InvitationsTable } from '@/components/team/InvitationsTable';
import { InviteForm } from '@/components/team/InviteForm';
import { MembersTable } from '@/components/team/MembersTable';
import { Banner, Card, Loading, Screen } from '@/components/ui';
import { useSessionQuery, useUpdateOrganisationMutation } from '@/lib/api/session';
import { useInviteMutation, useTeamQuery } from '@/lib/api/team';
import { can } from '@/lib/roles';
import { breakpoints, space } from '@/lib/theme';

export default function TeamScreen() {
  const { data: session } = useSessionQuery();
  const owner = can(session?.user.role, 'team.manage');
  const team = useTeamQuery(owner);
  const invite = useInviteMutation();
  const settings = useUpdateOrganisationMutation();
  const { width } = useWindowDimensions();
  const wide = width >= breakpoints.wide + 240;
  if (!session) return null;
  if (!owner) {
    return (
      <Screen title="Team">
        <Banner tone="caution" title="Owners only">
          Only an owner of the brewery can see and manage the team. Ask an owner if your role needs to change.
        </Banner>
      </Screen>
    );
  }
  return (
    <Screen title="Team" subtitle={`Who works at ${session.organisation.name}, and what each person may do.`}>
      {team.isError ? <Banner tone="danger">{team.error.message}</Banner> : null}
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={[styles.main, wide && styles.mainWide]}>
          <Card title="Members" aside={team.data ? `${team.data.members.length}` : undefined}>
            {team.data ? <MembersTable members={team.data.members} currentUserId={session.user.id} /> : <Loading />}
          </Card>
          <Card title="Open invitations">
            {team.data ? <InvitationsTable invitations={team.data.invitations} /> : <Loading />}
          </Card>
        </View>
        <View style={[styles.side, wide && styles.sideWide]}>
          <Card title="Invite someone">
            {invite.isSuccess ? (
              <Banner tone="success">{`Invitation sent to ${invite.data.email}. The link works once and expires in 7 days.`}</Banner>
            ) : null}
            <InviteForm error={invite.error} onSubmit={(values) => invite.mutateAsync(values)} />
          </Card>
          <Card title="Brewery settings">
            <BrewerySettingsForm
              organisation={session.organisation}
              error={settings.error}
              saved={settings.isSuccess}
              onSubmit={(input) => settings.mutateAsync(input)}
            />
          </Card>
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  columns: { gap: space.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  // Shares of the width side by side only: in one column on a phone, flex would stretch them down the page.
  main: { gap: space.lg },
  mainWide: { flex: 2 },
  side: { gap: space.lg },
  sideWide: { flex: 1, minWidth: 320 },
});
