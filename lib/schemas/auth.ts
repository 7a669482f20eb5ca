import * as yup from 'yup';

import { email, password, personName, token } from './common';

export const signInSchema = yup.object({
  email: email(),
  password: yup.string().max(200, 'That password is too long.').required('Enter your password.'),
});
export type SignInInput = yup.InferType<typeof signInSchema>;

export const signUpSchema = yup.object({
  breweryName: yup
    .string()
    .trim()
    .min(2, 'Enter the brewery name (at least 2 characters).')
    .max(80, 'Keep the brewery name under 80 characters.')
    .required('Enter the brewery name.'),
  name: personName(),
  email: email(),
  password: password(),
});
export type SignUpInput = yup.InferType<typeof signUpSchema>;

export const confirmSignUpSchema = yup.object({ token: token() });
export type ConfirmSignUpInput = yup.InferType<typeof confirmSignUpSchema>;

export const forgotPasswordSchema = yup.object({ email: email() });
export type ForgotPasswordInput = yup.InferType<typeof forgotPasswordSchema>;

export const resetPasswordSchema = yup.object({
  token: token(),
  password: password('a new password'),
});
export type ResetPasswordInput = yup.InferType<typeof resetPasswordSchema>;

export const acceptInvitationSchema = yup.object({
  token: token(),
  name: personName(),
  password: password(),
});
export type AcceptInvitationInput = yup.InferType<typeof acceptInvitationSchema>;

export const invitationTokenParams = yup.object({ token: token() });
