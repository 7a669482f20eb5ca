import { useField } from 'formik';

import { TextField, type TextFieldProps } from './TextField';

interface Props extends Omit<TextFieldProps, 'value' | 'onChangeText' | 'onBlur' | 'error'> {
  name: string;
}

/** A TextField bound to a formik field. Its error shows once the field is touched or the form submitted. */
export function FormField({ name, ...rest }: Props) {
  const [field, meta, helpers] = useField<string>(name);
  return (
    <TextField
      {...rest}
      value={field.value ?? ''}
      onChangeText={(text) => helpers.setValue(text)}
      onBlur={() => helpers.setTouched(true)}
      error={meta.touched ? meta.error : undefined}
    />
  );
}
