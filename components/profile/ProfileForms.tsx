import { Formik } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Banner, Button, FormField, FormStatus, submitTo } from '@/components/ui';
import { PASSWORD_MIN_LENGTH } from '@/lib/schemas/common';
import { type ChangePasswordInput, changePasswordSchema, type ProfileInput, profileSchema } from '@/lib/schemas/team';
import { space } from '@/lib/theme';

interface FormProps<V> {
  onSubmit: (values: V) => Promise<unknown>;
  error: unknown;
  saved: boolean;
}

export function ProfileForm({ name, onSubmit, error, saved }: FormProps<ProfileInput> & { name: string }) {
  return (
    <Formik<ProfileInput>
      initialValues={{ name }}
      enableReinitialize
      validationSchema={profileSchema}
      onSubmit={submitTo(onSubmit, { schema: profileSchema })}
    >
      {({ handleSubmit, isSubmitting, dirty }) => (
        <View style={styles.form}>
          <FormStatus error={error} />
          {saved && !dirty ? <Banner tone="success">Your name is saved.</Banner> : null}
          <FormField name="name" label="Name" autoComplete="name" />
          <Button
            label="Save name"
            busy={isSubmitting}
            disabled={!dirty}
            onPress={() => handleSubmit()}
            style={styles.submit}
          />
        </View>
      )}
    </Formik>
  );
}

export function PasswordForm({ onSubmit, error, saved }: FormProps<ChangePasswordInput>) {
  return (
    <Formik<ChangePasswordInput>
      initialValues={{ currentPassword: '', newPassword: '' }}
      validationSchema={changePasswordSchema}
      onSubmit={submitTo(onSubmit, { afterSuccess: (helpers) => helpers.resetForm() })}
    >
      {({ handleSubmit, isSubmitting }) => (
        <View style={styles.form}>
          <FormStatus error={error} />
          {saved ? <Banner tone="success">Password changed. Your other sessions have been signed out.</Banner> : null}
          <FormField name="currentPassword" label="Current password" secureTextEntry autoComplete="current-password" />
          <FormField
            name="newPassword"
            label="New password"
            secureTextEntry
            autoComplete="new-password"
            hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          />
          <Button label="Change password" busy={isSubmitting} onPress={() => handleSubmit()} style={styles.submit} />
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  submit: { alignSelf: 'flex-start' },
});
