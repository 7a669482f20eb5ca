import type { Session } from '@/lib/api/types';
import type { ChangePasswordInput, OrganisationInput, PreferencesInput, ProfileInput } from '@/lib/schemas/team';
import { Organisation, User } from '@/server/db';
import { badRequest } from '@/server/errors';

import { sessionFor } from './auth';
import { checkPassword, hashPassword } from './passwords';

export async function updateProfile(userId: number, input: ProfileInput): Promise<Session> {
  await User.update({ name: input.name }, { where: { id: userId }, individualHooks: true });
  return sessionFor(userId);
}

export async function updatePreferences(userId: number, input: PreferencesInput): Promise<Session> {
  const changes = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
  if (Object.keys(changes).length > 0) await User.update(changes, { where: { id: userId }, individualHooks: true });
  return sessionFor(userId);
}

/** The brewery's own settings (owners only): its name, its alcohol limit, the warmest its bottles may meet and its margin. */
export async function updateOrganisation(
  organisationId: number,
  userId: number,
  input: OrganisationInput,
): Promise<Session> {
  const organisation = await Organisation.findByPk(organisationId, { rejectOnEmpty: true });
  // Who declared the licence, and when, is kept with it: it lets versions over the alcohol limit be approved.
  const licence =
    input.licensedForAlcohol !== undefined && input.licensedForAlcohol !== organisation.licensedForAlcohol
      ? { licensedForAlcohol: input.licensedForAlcohol, licenceDeclaredById: userId, licenceDeclaredAt: new Date() }
      : {};
  const given = {
    warmestTempC: input.warmestTempC,
    ratingSharePercent: input.ratingSharePercent,
    lotPrefix: input.lotPrefix,
    currency: input.currency,
  };
  const settings = Object.fromEntries(Object.entries(given).filter(([, value]) => value !== undefined));
  await organisation.update({ name: input.name, abvLimitPercent: input.abvLimitPercent, ...settings, ...licence });
  return sessionFor(userId);
}

/** Changes the password after checking the current one; other sessions of the account end. */
export async function changePassword(userId: number, input: ChangePasswordInput): Promise<User> {
  const user = await User.findByPk(userId, { rejectOnEmpty: true });
  if (!(await checkPassword(input.currentPassword, user.passwordHash))) {
    throw badRequest('The current password is not right.', { currentPassword: 'This is not your current password.' });
  }
  await user.update({ passwordHash: await hashPassword(input.newPassword), tokenVersion: user.tokenVersion + 1 });
  return user;
}
