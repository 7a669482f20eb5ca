import { Formik } from 'formik';
import { View } from 'react-native';

import { Button } from '@/components/ui/Button';
import { FormField } from '@/components/ui/FormField';
import { submitTo } from '@/components/ui/forms';
import { FormStatus } from '@/components/ui/FormStatus';
import { type SignInInput, signInSchema } from '@/lib/schemas/auth';

import { formStyles } from './form-styles';

interface Props {
  onSubmit: (values: SignInInput) => Promise<unknown>;
  error: unknown;
}

export function SignInForm({ onSubmit, error }: Props) {
  return (
    <Formik<SignInInput>
      initialValues={{ email: '', password: '' }}
      validationSchema={signInSchema}
      onSubmit={submitTo(onSubmit, { schema: signInSchema })}
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
            textContentType="emailAddress"
          />
          <FormField
            name="password"
            label="Password"
            secureTextEntry
            autoComplete="current-password"
            onSubmitEditing={() => handleSubmit()}
          />
          <Button label="Sign in" busy={isSubmitting} onPress={() => handleSubmit()} block />
        </View>
      )}
    </Formik>
  );
}
