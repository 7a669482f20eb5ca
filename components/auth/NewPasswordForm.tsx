import { Formik } from 'formik';
import { View } from 'react-native';

import { Button } from '@/components/ui/Button';
import { FormField } from '@/components/ui/FormField';
import { submitTo } from '@/components/ui/forms';
import { FormStatus } from '@/components/ui/FormStatus';
import { acceptInvitationSchema, resetPasswordSchema } from '@/lib/schemas/auth';
import { PASSWORD_MIN_LENGTH } from '@/lib/schemas/common';

import { formStyles } from './form-styles';

interface Props {
  token: string;
  /** Ask for a name too (accepting an invitation) or only a password (resetting one). */
  withName: boolean;
  submitLabel: string;
  onSubmit: (values: { token: string; password: string; name: string }) => Promise<unknown>;
  error: unknown;
}

/** Sets a password from a one-time link: for a reset, or with a name when accepting an invitation. */
export function NewPasswordForm({ token, withName, submitLabel, onSubmit, error }: Props) {
  return (
    <Formik
      initialValues={{ token, name: '', password: '' }}
      validationSchema={withName ? acceptInvitationSchema : resetPasswordSchema}
      onSubmit={submitTo(onSubmit)}
    >
      {({ handleSubmit, isSubmitting }) => (
        <View style={formStyles.form}>
          <FormStatus error={error} />
          {withName ? <FormField name="name" label="Your name" autoComplete="name" /> : null}
          <FormField
            name="password"
            label={withName ? 'Password' : 'New password'}
            secureTextEntry
            autoComplete="new-password"
            hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
            onSubmitEditing={() => handleSubmit()}
          />
          <Button label={submitLabel} busy={isSubmitting} onPress={() => handleSubmit()} block />
        </View>
      )}
    </Formik>
  );
}
