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

/**
 * Who may do what: the one list the server's `allow()` and every screen read. A capability names an action, never a
 * role, so a new role or a changed rule is one line here.
 */
export const CAPABILITIES = {
  /** Create, save, duplicate, archive and restore recipes; record tastings. */
  'recipes.edit': ['owner', 'developer'],
  /** Submit a version for review. */
  'recipes.submit': ['owner', 'developer'],
  /** Approve, return and withdraw: answering for what goes into production. */
  'recipes.approve': ['owner'],
  /** Work on recipes in development (drafts, tastings, history); others see what is approved for production. */
  'recipes.develop': ['owner', 'developer'],
  /** Enter a lab's nutrition values for a version: what the package will declare. */
  'recipes.label': ['owner'],
  /** Add and change house ingredients and their files. */
  'ingredients.edit': ['owner', 'developer'],
  /** Add, change and archive bottle formats and their ratings. */
  'bottles.edit': ['owner'],
  /** Invite, change roles, deactivate. */
  'team.manage': ['owner'],
  /** The brewery's name, alcohol limit, warm day, margin and licence. */
  'brewery.settings': ['owner'],
  /** Read the brewery's invitation and review mail in the outbox, beside one's own. */
  'outbox.brewery': ['owner'],
  /** See the brewery's batches, production and trial, and trace supplier lots. */
  'batches.read': ['owner', 'developer', 'brewer'],
  /** Start and run production batches of approved versions: readings, steps, lots, deviations. */
  'batches.run': ['owner', 'brewer'],
  /** Start and run trial batches of any version (never releasable). */
  'batches.trial': ['owner', 'developer'],
  /** Release, hold or discard a batch. */
  'batches.decide': ['owner'],
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof CAPABILITIES;

/** Whether a role may do something. An unknown role (signed out) may do nothing. */
export function can(role: Role | undefined, capability: Capability): boolean {
  return role !== undefined && (CAPABILITIES[capability] as readonly Role[]).includes(role);
}

/** The roles that may do something (for queries such as "who should review this"). */
export function rolesWith(capability: Capability): readonly Role[] {
  return CAPABILITIES[capability];
}

/** The role of the person who signs a brewery up: someone must be able to manage the team and approve recipes. */
export const FOUNDER_ROLE: Role = 'owner';
/** The role an invitation form starts with: the most common newcomer. */
export const DEFAULT_INVITE_ROLE: Role = 'developer';
