import { useLocalSearchParams, useRouter } from 'expo-router';
import { View } from 'react-native';

import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { FormStatus } from '@/components/ui/FormStatus';
import { Text } from '@/components/ui/Text';
import { TextLink } from '@/components/ui/TextLink';
import { useConfirmSignUpMutation } from '@/lib/api/session';

/** The page the sign-up e-mail links to. A press, not the page load, creates the account, so a mail scanner opening the link does nothing. */
export default function ConfirmSignUpScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  const confirm = useConfirmSignUpMutation();
  return (
    <>
      <View>
        <Text variant="heading" level={1}>
          Confirm your address
        </Text>
        <Text variant="muted">
          Your brewery account is created when you confirm, and you are signed in as its owner.
        </Text>
      </View>
      {token ? (
        <>
          <FormStatus error={confirm.error} />
          <Button
            label="Confirm and create the account"
            block
            busy={confirm.isPending}
            onPress={() => confirm.mutate({ token }, { onSuccess: () => router.replace('/') })}
          />
        </>
      ) : (
        <Banner tone="danger">This link is incomplete. Open the link from the e-mail again, or sign up again.</Banner>
      )}
      <TextLink href="/sign-in">Back to sign in</TextLink>
    </>
  );
}
