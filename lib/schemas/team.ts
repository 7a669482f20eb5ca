import * as yup from 'yup';

import { ROLES, type Role } from '../roles';
import { email, password, personName } from './common';

const role = () =>
  yup
    .string()
    .oneOf(ROLES, 'Choose owner, recipe developer or brewer.')
    .required('Choose a role.') as yup.StringSchema<Role>;

export const inviteSchema = yup.object({
  email: email(),
  role: role(),
});
export type InviteInput = yup.InferType<typeof inviteSchema>;

export const changeRoleSchema = yup.object({ role: role() });
export type ChangeRoleInput = yup.InferType<typeof changeRoleSchema>;

export const profileSchema = yup.object({ name: personName() });
export type ProfileInput = yup.InferType<typeof profileSchema>;

export const changePasswordSchema = yup.object({
  currentPassword: yup.string().max(200, 'That password is too long.').required('Enter your current password.'),
  newPassword: password('a new password').notOneOf(
    [yup.ref('currentPassword')],
    'Choose a password different from the current one.',
  ),
});
export type ChangePasswordInput = yup.InferType<typeof changePasswordSchema>;
