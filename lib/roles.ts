/** The three roles of a brewery team. Order matters: it is the order shown in pickers. */
export const ROLES = ['owner', 'developer', 'brewer'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  developer: 'Recipe developer',
  brewer: 'Brewer',
};

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: 'Approves recipes for production, manages the team and answers for safety.',
  developer: 'Designs flavours, tastes and adjusts them, and scales recipes.',
  brewer: 'Runs approved recipes on the floor and logs readings.',
};

/** Who may manage the team (invite, change roles, deactivate). */
export function canManageTeam(role: Role | undefined): boolean {
  return role === 'owner';
}
