import * as yup from 'yup';

/** Shortest password we accept: NIST SP 800-63B section 5.1.1.2 asks at least 8 characters. */
export const PASSWORD_MIN_LENGTH = 8;
/** bcrypt reads only the first 72 bytes of a password; refuse longer ones rather than silently truncate. */
export const PASSWORD_MAX_LENGTH = 72;

export const email = () =>
  yup
    .string()
    .trim()
    .lowercase()
    .max(254, 'An e-mail address has at most 254 characters.')
    .email('Enter an e-mail address such as name@brewery.com.')
    .required('Enter your e-mail address.');

export const password = (label = 'a password') =>
  yup
    .string()
    .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
    .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`)
    .required(`Enter ${label}.`);

export const personName = () =>
  yup
    .string()
    .trim()
    .min(1, 'Enter your name.')
    .max(80, 'Keep the name under 80 characters.')
    .required('Enter your name.');

export const token = () =>
  yup
    .string()
    .trim()
    .min(20, 'This link is incomplete.')
    .max(200, 'This link is not valid.')
    .required('This link is incomplete.');

/** The largest id a row can have: ids are 32-bit integers on PostgreSQL. */
export const MAX_ID = 2_147_483_647;

export const idParam = yup.object({
  id: yup
    .number()
    .integer('Not a valid id.')
    .positive('Not a valid id.')
    .max(MAX_ID, 'Not a valid id.')
    .required('An id is required.'),
});

/** The brewery's prefix for lot codes: letters and digits, as printed on labels. */
export const lotPrefixField = () =>
  yup
    .string()
    .trim()
    .uppercase()
    .matches(/^[A-Z0-9]{1,8}$/, 'Use 1 to 8 letters or digits for the lot prefix.');
