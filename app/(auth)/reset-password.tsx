import { useLocalSearchParams, useRouter } from 'expo-router';
import { View } from 'react-native';

import { NewPasswordForm } from '@/components/auth/NewPasswordForm';
import { Banner } from '@/components/ui/Banner';
import { Text } from '@/components/ui/Text';
import { TextLink } from '@/components/ui/TextLink';
import { useResetPasswordMutation } from '@/lib/api/session';

export default function ResetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const reset = useResetPasswordMutation();
  return (
    <>
      <View>
        <Text variant="heading" level={1}>
          Choose a new password
        </Text>
        <Text variant="muted">Every other session of your account will be signed out.</Text>
      </View>
      {token ? (
        <NewPasswordForm
          token={token}
          withName={false}
          submitLabel="Save new password"
          error={reset.error}
          onSubmit={async ({ token: t, password }) => {
            await reset.mutateAsync({ token: t, password });
            router.replace('/');
          }}
        />
      ) : (
        <Banner tone="danger">
          This link is incomplete. Open the link from the e-mail again, or ask for a new one.
        </Banner>
      )}
      <TextLink href="/forgot-password">Ask for a new link</TextLink>
    </>
  );
}
