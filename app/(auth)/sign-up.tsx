import { useRouter } from 'expo-router';
import { View } from 'react-native';

import { formStyles } from '@/components/auth/form-styles';
import { SignUpForm } from '@/components/auth/SignUpForm';
import { Text, TextLink } from '@/components/ui';
import { useSignUpMutation } from '@/lib/api/session';

export default function SignUpScreen() {
  const router = useRouter();
  const signUp = useSignUpMutation();
  return (
    <>
      <View>
        <Text variant="heading" level={1}>
          Create a brewery account
        </Text>
        <Text variant="muted">You will be its owner, and can invite your team next.</Text>
      </View>
      <SignUpForm error={signUp.error} onSubmit={async (values) => {
        await signUp.mutateAsync(values);
        router.replace('/');
      }} />
      <View style={formStyles.row}>
        <Text variant="muted">Already have an account?</Text>
        <TextLink href="/sign-in">Sign in</TextLink>
      </View>
    </>
  );
}
