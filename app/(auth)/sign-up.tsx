import { useState } from 'react';
import { View } from 'react-native';

import { formStyles } from '@/components/auth/form-styles';
import { NoMailNotice } from '@/components/auth/NoMailNotice';
import { SignUpForm } from '@/components/auth/SignUpForm';
import { Banner } from '@/components/ui/Banner';
import { Text } from '@/components/ui/Text';
import { TextLink } from '@/components/ui/TextLink';
import { useServerInfoQuery, useSignUpMutation } from '@/lib/api/session';

export default function SignUpScreen() {
  const signUp = useSignUpMutation();
  const serverInfo = useServerInfoQuery();
  const [email, setEmail] = useState('');
  return (
    <>
      <View>
        <Text variant="heading" level={1}>
          Create a brewery account
        </Text>
        <Text variant="muted">
          You will be its owner, and can invite your team next. We first confirm your e-mail address.
        </Text>
      </View>
      {signUp.isSuccess ? (
        <>
          <Banner tone="success" title="Check your e-mail">
            {`${signUp.data.message} It went to ${email}.`}
          </Banner>
          <NoMailNotice serverInfo={serverInfo.data} email={email} purpose="confirm the sign-up" />
        </>
      ) : (
        <SignUpForm
          error={signUp.error}
          onSubmit={(values) => {
            setEmail(values.email);
            return signUp.mutateAsync(values);
          }}
        />
      )}
      <View style={formStyles.row}>
        <Text variant="muted">Already have an account?</Text>
        <TextLink href="/sign-in">Sign in</TextLink>
      </View>
    </>
  );
}
