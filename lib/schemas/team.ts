import * as yup from 'yup';

import { CURRENCIES } from '@/lib/format';
import { type Role, ROLES } from '@/lib/roles';
import { UNIT_SYSTEMS, type UnitSystem } from '@/lib/units';

import { email, lotPrefixField, password, personName } from './common';
import { numberField } from './numbers';

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

export const preferencesSchema = yup.object({
  unitSystem: yup.string().oneOf(UNIT_SYSTEMS, 'Choose metric or US units.').optional() as yup.StringSchema<
    UnitSystem | undefined
  >,
  notifyReviews: yup.boolean().optional(),
});
export type PreferencesInput = yup.InferType<typeof preferencesSchema>;

export const organisationSchema = yup.object({
  name: yup
    .string()
    .trim()
    .min(2, 'Enter the brewery name (at least 2 characters).')
    .max(80, 'Keep the brewery name under 80 characters.')
    .required('Enter the brewery name.'),
  abvLimitPercent: numberField('Alcohol limit', { positive: true, max: 5, unit: '% ABV' }).required(
    'Enter the alcohol limit in % ABV.',
  ),
  // Left out, a setting keeps its value: a client that does not know a setting cannot reset it.
  warmestTempC: numberField('Warmest the bottles may meet', { min: 20, max: 60, unit: '°C' }).optional(),
  // Never above 100 %: the rating itself. Below half the rating most fizz targets become unreachable.
  ratingSharePercent: numberField('Most sugar: share of the bottle rating', {
    min: 50,
    max: 100,
    unit: '%',
  }).optional(),
  licensedForAlcohol: yup.boolean().strict().optional(),
  lotPrefix: lotPrefixField().optional(),
  currency: yup.string().oneOf(CURRENCIES, 'Choose a currency from the list.').optional(),
});
export type OrganisationInput = yup.InferType<typeof organisationSchema>;

export const changePasswordSchema = yup.object({
  currentPassword: yup.string().max(200, 'That password is too long.').required('Enter your current password.'),
  newPassword: password('a new password').notOneOf(
    [yup.ref('currentPassword')],
    'Choose a password different from the current one.',
  ),
});
export type ChangePasswordInput = yup.InferType<typeof changePasswordSchema>;
