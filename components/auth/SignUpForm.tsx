import { Formik } from 'formik';
import { View } from 'react-native';

import { Button } from '@/components/ui/Button';
import { FormField } from '@/components/ui/FormField';
import { submitTo } from '@/components/ui/forms';
import { FormStatus } from '@/components/ui/FormStatus';
import { type SignUpInput, signUpSchema } from '@/lib/schemas/auth';
import { PASSWORD_MIN_LENGTH } from '@/lib/schemas/common';

import { formStyles } from './form-styles';

interface Props {
  onSubmit: (values: SignUpInput) => Promise<unknown>;
  error: unknown;
}

export function SignUpForm({ onSubmit, error }: Props) {
  return (
    <Formik<SignUpInput>
      initialValues={{ breweryName: '', name: '', email: '', password: '' }}
      validationSchema={signUpSchema}
      onSubmit={submitTo(onSubmit, { schema: signUpSchema })}
    >
      {({ handleSubmit, isSubmitting }) => (
        <View style={formStyles.form}>
          <FormStatus error={error} />
          <FormField name="breweryName" label="Brewery name" autoComplete="organization" />
          <FormField name="name" label="Your name" autoComplete="name" />
          <FormField name="email" label="E-mail" autoComplete="email" inputMode="email" autoCapitalize="none" />
          <FormField
            name="password"
            label="Password"
            secureTextEntry
            autoComplete="new-password"
            hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
            onSubmitEditing={() => handleSubmit()}
          />
          <Button label="Create brewery account" busy={isSubmitting} onPress={() => handleSubmit()} block />
        </View>
      )}
    </Formik>
  );
}
