import { useField } from 'formik';

import { NumberField } from './NumberField';
import type { TextFieldProps } from './TextField';

interface Props extends Omit<
  TextFieldProps,
  'value' | 'onChangeText' | 'onBlur' | 'error' | 'keyboardType' | 'inputMode'
> {
  name: string;
  /** The unit shown after the number, e.g. "g/L" or "°C". */
  unit?: string;
}

/**
 * A number input bound to a formik field: the text as typed (the form's schema parses it and says what is wrong),
 * the decimal keypad on phones, the unit after the number, the error once the field is touched.
 */
export function FormNumberField({ name, ...rest }: Props) {
  const [field, meta, helpers] = useField<string>(name);
  return (
    <NumberField
      {...rest}
      value={field.value ?? ''}
      onChangeText={(text) => helpers.setValue(text)}
      onBlur={() => helpers.setTouched(true)}
      error={meta.touched ? meta.error : undefined}
    />
  );
}
