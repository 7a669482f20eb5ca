import { useLocalSearchParams, useRouter } from 'expo-router';
import { View } from 'react-native';

import { NewPasswordForm } from '@/components/auth/NewPasswordForm';
import { Banner } from '@/components/ui/Banner';
import { Loading } from '@/components/ui/Loading';
import { Text } from '@/components/ui/Text';
import { TextLink } from '@/components/ui/TextLink';
import { useAcceptInvitationMutation, useInvitationQuery } from '@/lib/api/session';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '@/lib/roles';

export default function AcceptInvitationScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const invitation = useInvitationQuery(token);
  const accept = useAcceptInvitationMutation();
  if (!token)
    return <Banner tone="danger">This invitation link is incomplete. Open the link from the e-mail again.</Banner>;
  if (invitation.isPending) return <Loading label="Reading the invitation…" />;
  if (invitation.isError) {
    return (
      <>
        <Text variant="heading" level={1}>
          Invitation
        </Text>
        <Banner tone="danger">{invitation.error.message}</Banner>
        <TextLink href="/sign-in">Go to sign in</TextLink>
      </>
    );
  }
  const { breweryName, email, role, invitedBy } = invitation.data;
  return (
    <>
      <View>
        <Text variant="heading" level={1}>
          Join {breweryName}
        </Text>
        <Text variant="muted">
          {invitedBy ? `${invitedBy} invited ` : 'You are invited as '}
          {invitedBy ? `${email} as ` : ''}
          {ROLE_LABELS[role].toLowerCase()}. {ROLE_DESCRIPTIONS[role]}
        </Text>
      </View>
      <NewPasswordForm
        token={token}
        withName
        submitLabel="Join the brewery"
        error={accept.error}
        onSubmit={async (values) => {
          await accept.mutateAsync(values);
          router.replace('/');
        }}
      />
    </>
  );
}
