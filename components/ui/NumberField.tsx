import { forwardRef } from 'react';
import type { TextInput } from 'react-native';

import { TextField, type TextFieldProps } from './TextField';

interface Props extends Omit<TextFieldProps, 'keyboardType' | 'inputMode'> {
  /** The unit shown after the number, e.g. "g/L" or "°C". */
  unit?: string;
}

/**
 * A number input. It keeps what the person typed as text (so "2." or "-" survive while typing) and leaves
 * parsing to the form's schema, which says clearly what is wrong.
 */
export const NumberField = forwardRef<TextInput, Props>(function NumberField({ unit, ...rest }, ref) {
  return (
    <TextField ref={ref} inputMode="decimal" keyboardType="decimal-pad" suffix={unit} autoComplete="off" {...rest} />
  );
});
