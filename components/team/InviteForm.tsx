import { Formik, type FormikHelpers } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Button, FormField, FormStatus, Select, submitTo } from '@/components/ui';
import { DEFAULT_INVITE_ROLE } from '@/lib/roles';
import { type InviteInput, inviteSchema } from '@/lib/schemas/team';
import { space } from '@/lib/theme';

import { roleOptions } from './role-options';

interface Props {
  onSubmit: (values: InviteInput) => Promise<unknown>;
  error: unknown;
}

const initialValues: InviteInput = { email: '', role: DEFAULT_INVITE_ROLE };

/** After sending, the address clears for the next person; the role stays as chosen. */
const keepRole = (helpers: FormikHelpers<InviteInput>) => {
  void helpers.setFieldValue('email', '', false);
  void helpers.setTouched({}, false);
};

export function InviteForm({ onSubmit, error }: Props) {
  return (
    <Formik<InviteInput>
      initialValues={initialValues}
      validationSchema={inviteSchema}
      onSubmit={submitTo(onSubmit, { schema: inviteSchema, afterSuccess: keepRole })}
    >
      {({ handleSubmit, isSubmitting, values, setFieldValue, errors, touched }) => (
        <View style={styles.form}>
          <FormStatus error={error} />
          <FormField
            name="email"
            label="E-mail of the person to invite"
            inputMode="email"
            autoCapitalize="none"
            autoComplete="off"
          />
          <Select
            label="Role"
            value={values.role}
            options={roleOptions}
            onChange={(role) => setFieldValue('role', role)}
            error={touched.role ? errors.role : undefined}
          />
          <Button label="Send invitation" busy={isSubmitting} onPress={() => handleSubmit()} style={styles.submit} />
        </View>
      )}
    </Formik>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  submit: { alignSelf: 'flex-start' },
});
