import { Formik } from 'formik';
import { View } from 'react-native';

import { Button } from '@/components/ui/Button';
import { FormField } from '@/components/ui/FormField';
import { submitTo } from '@/components/ui/forms';
import { FormStatus } from '@/components/ui/FormStatus';
import { type ForgotPasswordInput, forgotPasswordSchema } from '@/lib/schemas/auth';

import { formStyles } from './form-styles';

interface Props {
  onSubmit: (values: ForgotPasswordInput) => Promise<unknown>;
  error: unknown;
}

/** Asks for the e-mail address that should receive a reset link. */
export function ForgotPasswordForm({ onSubmit, error }: Props) {
  return (
    <Formik<ForgotPasswordInput>
      initialValues={{ email: '' }}
      validationSchema={forgotPasswordSchema}
      onSubmit={submitTo(onSubmit, { schema: forgotPasswordSchema })}
    >
      {({ handleSubmit, isSubmitting }) => (
        <View style={formStyles.form}>
          <FormStatus error={error} />
          <FormField
            name="email"
            label="E-mail"
            autoComplete="email"
            inputMode="email"
            autoCapitalize="none"
            onSubmitEditing={() => handleSubmit()}
          />
          <Button label="Send reset link" busy={isSubmitting} onPress={() => handleSubmit()} block />
        </View>
      )}
    </Formik>
  );
}
