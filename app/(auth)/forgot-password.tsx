import { View } from 'react-native';

import { ForgotPasswordForm } from '@/components/auth/EmailForm';
import { formStyles } from '@/components/auth/form-styles';
import { Banner, Text, TextLink } from '@/components/ui';
import { useForgotPasswordMutation, useServerInfoQuery } from '@/lib/api/session';

export default function ForgotPasswordScreen() {
  const request = useForgotPasswordMutation();
  const serverInfo = useServerInfoQuery();
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
        <ForgotPasswordForm error={request.error} onSubmit={(values) => request.mutateAsync(values)} />
      )}
      {request.isSuccess && serverInfo.data?.outboxOpen ? (
        <Banner tone="info" title="No mail server here">
          <View style={formStyles.row}>
            <Text>This server keeps e-mail in its</Text>
            <TextLink href="/outbox">Mail outbox</TextLink>
          </View>
        </Banner>
      ) : null}
      <TextLink href="/sign-in">Back to sign in</TextLink>
    </>
  );
}
