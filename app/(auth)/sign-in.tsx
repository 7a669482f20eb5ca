import { useRouter } from 'expo-router';
import { View } from 'react-native';

import { formStyles } from '@/components/auth/form-styles';
import { SignInForm } from '@/components/auth/SignInForm';
import { Text } from '@/components/ui/Text';
import { TextLink } from '@/components/ui/TextLink';
import { useSignInMutation } from '@/lib/api/session';

export default function SignInScreen() {
  const router = useRouter();
  const signIn = useSignInMutation();
  return (
    <>
      <Text variant="heading" level={1}>
        Sign in
      </Text>
      <SignInForm
        error={signIn.error}
        onSubmit={async (values) => {
          await signIn.mutateAsync(values);
          router.replace('/');
        }}
      />
      <View style={formStyles.links}>
        <TextLink href="/forgot-password">Forgot your password?</TextLink>
        <View style={formStyles.row}>
          <Text variant="muted">New to Fizzwright?</Text>
          <TextLink href="/sign-up">Create a brewery account</TextLink>
        </View>
      </View>
    </>
  );
}
