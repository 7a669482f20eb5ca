import type { FormikHelpers } from 'formik';
import type { AnyObjectSchema } from 'yup';

import { ApiError } from '@/lib/api/client';

interface Options<Values> {
  /** The form's schema: values are sent cleaned by it (trimmed, lower-cased e-mail), as the server would. */
  schema?: AnyObjectSchema;
  afterSuccess?: (helpers: FormikHelpers<Values>) => void;
}

/**
 * Wraps a mutation for formik's onSubmit: when the server answers with field messages they land on the same
 * fields the person typed into. The mutation keeps its error for the form-level banner.
 */
export function submitTo<Values extends object>(
  mutate: (values: Values) => Promise<unknown>,
  options: Options<Values> = {},
) {
  return async (values: Values, helpers: FormikHelpers<Values>) => {
    try {
      await mutate(options.schema ? (options.schema.cast(values) as Values) : values);
      options.afterSuccess?.(helpers);
    } catch (error) {
      if (error instanceof ApiError && Object.keys(error.fields).length > 0) {
        helpers.setErrors(error.fields as never);
        helpers.setTouched(Object.fromEntries(Object.keys(error.fields).map((key) => [key, true])) as never, false);
      }
    }
  };
}
