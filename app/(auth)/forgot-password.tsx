import { useState } from 'react';
import { View } from 'react-native';

import { ForgotPasswordForm } from '@/components/auth/EmailForm';
import { NoMailNotice } from '@/components/auth/NoMailNotice';
import { Banner } from '@/components/ui/Banner';
import { Text } from '@/components/ui/Text';
import { TextLink } from '@/components/ui/TextLink';
import { useForgotPasswordMutation, useServerInfoQuery } from '@/lib/api/session';

export default function ForgotPasswordScreen() {
  const request = useForgotPasswordMutation();
  const serverInfo = useServerInfoQuery();
  const [email, setEmail] = useState('');
  return (
    <>
      <View>
        <Text variant="heading" level={1}>
          Reset your password
        </Text>
        <Text variant="muted">We will e-mail you a link that works once, for 1 hour.</Text>
      </View>
      {request.isSuccess ? (
        <Banner tone="success" title="Check your e-mail">
          {request.data.message}
        </Banner>
      ) : (
        <ForgotPasswordForm
          error={request.error}
          onSubmit={(values) => {
            setEmail(values.email);
            return request.mutateAsync(values);
          }}
        />
      )}
      <NoMailNotice serverInfo={serverInfo.data} email={email} purpose="choose a new password" />
      <TextLink href="/sign-in">Back to sign in</TextLink>
    </>
  );
}
