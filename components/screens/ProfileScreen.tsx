import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { PasswordForm, ProfileForm } from '@/components/profile/ProfileForms';
import { Badge, Button, Card, Screen, Segmented, Text } from '@/components/ui';
import {
  useChangePasswordMutation,
  useSessionQuery,
  useSignOutMutation,
  useUpdatePreferencesMutation,
  useUpdateProfileMutation,
} from '@/lib/api/session';
import { can, ROLE_LABELS } from '@/lib/roles';
import { space } from '@/lib/theme';

export default function ProfileScreen() {
  const router = useRouter();
  const { data: session } = useSessionQuery();
  const update = useUpdateProfileMutation();
  const changePassword = useChangePasswordMutation();
  const signOut = useSignOutMutation();
  const preferences = useUpdatePreferencesMutation();
  if (!session) return null;
  return (
    <Screen title="Profile" subtitle={session.user.email} maxWidth={720}>
      <Card title="You" aside={<Badge label={ROLE_LABELS[session.user.role]} tone="info" />}>
        <ProfileForm
          name={session.user.name}
          error={update.error}
          saved={update.isSuccess}
          onSubmit={(values) => update.mutateAsync(values)}
        />
      </Card>
      <Card title="Password">
        <PasswordForm
          error={changePassword.error}
          saved={changePassword.isSuccess}
          onSubmit={(values) => changePassword.mutateAsync(values)}
        />
      </Card>
      {can(session.user.role, 'recipes.submit') || can(session.user.role, 'batches.decide') ? (
        <Card title="E-mail">
          <Segmented
            label={
              can(session.user.role, 'batches.decide')
                ? 'Review and batch e-mails (a recipe submitted for review; a danger reading on a batch; a batch waiting for your decision)'
                : 'Review e-mails (your submission approved or returned)'
            }
            value={session.user.notifyReviews ? 'on' : 'off'}
            onChange={(value) => preferences.mutate({ notifyReviews: value === 'on' })}
            options={[
              { value: 'on', label: 'Send them' },
              { value: 'off', label: 'Do not send' },
            ]}
          />
        </Card>
      ) : null}
      <Card title="Session">
        <View style={styles.row}>
          <Text variant="muted">Signed in to {session.organisation.name}.</Text>
          <Button
            label="Sign out"
            variant="secondary"
            busy={signOut.isPending}
            onPress={() => signOut.mutate(undefined, { onSuccess: () => router.replace('/sign-in') })}
          />
        </View>
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: space.md },
});
