import { type Role, ROLE_LABELS } from '@/lib/roles';
import { config } from '@/server/config';

interface Rendered {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (value: string) =>
  value.replace(/[&<>"']/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[ch]!);

function render(
  subject: string,
  paragraphs: string[],
  link: { url: string; label: string } | null,
  footer: string,
): Rendered {
  const text = [
    ...paragraphs,
    ...(link ? ['', `${link.label}: ${link.url}`] : []),
    '',
    footer,
    '',
    '— Fizzwright',
  ].join('\n');
  const html = [
    '<div style="font-family:sans-serif;color:#1B2422;max-width:560px">',
    ...paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`),
    ...(link
      ? [
          `<p><a href="${escapeHtml(link.url)}" style="background:#1E4A43;color:#fff;padding:10px 16px;border-radius:8px;text-decoration:none">${escapeHtml(link.label)}</a></p>`,
        ]
      : []),
    `<p style="color:#4E5A57;font-size:13px">${escapeHtml(footer)}</p>`,
    '</div>',
  ].join('\n');
  return { subject, text, html };
}

export function invitationMail(input: {
  breweryName: string;
  inviterName: string | null;
  role: Role;
  token: string;
}): Rendered {
  const url = `${config.appUrl}/accept-invitation?token=${encodeURIComponent(input.token)}`;
  const who = input.inviterName ? `${input.inviterName} has invited you` : 'You have been invited';
  return render(
    `Join ${input.breweryName} on Fizzwright`,
    [
      `${who} to join ${input.breweryName} on Fizzwright as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      'Choose your name and a password to get started.',
    ],
    { url, label: 'Accept the invitation' },
    'This link works once and expires in 7 days. If you did not expect it, ignore this message.',
  );
}

/** The link that finishes a sign-up: the brewery and its owner exist only once the address is confirmed. */
export function confirmSignUpUrl(token: string): string {
  return `${config.appUrl}/confirm-sign-up?token=${encodeURIComponent(token)}`;
}

export function resetPasswordUrl(token: string): string {
  return `${config.appUrl}/reset-password?token=${encodeURIComponent(token)}`;
}

export function signUpConfirmationMail(input: { name: string; breweryName: string; token: string }): Rendered {
  return render(
    `Confirm your address to create ${input.breweryName} on Fizzwright`,
    [
      `Hello ${input.name},`,
      `Follow the link to confirm this address and create the brewery account for ${input.breweryName}. You will be its owner.`,
    ],
    { url: confirmSignUpUrl(input.token), label: 'Confirm and create the account' },
    'This link works once and expires in 24 hours. If you did not sign up, ignore this message: nothing is created.',
  );
}

/** Sent instead of a confirmation when the address already has an account, so a sign-up never tells who has one. */
export function signUpAttemptMail(input: { name: string }): Rendered {
  return render(
    'Someone tried to sign up with your address',
    [
      `Hello ${input.name},`,
      'Someone (perhaps you) tried to create a new Fizzwright brewery account with this e-mail address. It already has an account, so nothing was created.',
      'If it was you, sign in instead; if you forgot your password, ask for a reset link on the sign-in page.',
    ],
    { url: `${config.appUrl}/sign-in`, label: 'Sign in' },
    'If it was not you, you can ignore this message: your account is unchanged.',
  );
}

export function passwordResetMail(input: { name: string; token: string }): Rendered {
  const url = resetPasswordUrl(input.token);
  return render(
    'Reset your Fizzwright password',
    [`Hello ${input.name},`, 'Someone (we hope you) asked to reset the password of your Fizzwright account.'],
    { url, label: 'Choose a new password' },
    'This link works once and expires in 1 hour. If you did not ask for it, ignore this message: your password stays as it is.',
  );
}

export function reviewSubmittedMail(input: {
  recipeName: string;
  version: number;
  author: string;
  message: string;
  recipeId: number;
}): Rendered {
  return render(
    `Review: ${input.recipeName} v${input.version}`,
    [
      `${input.author} submitted version ${input.version} of ${input.recipeName} for production.`,
      ...(input.message ? [`"${input.message}"`] : []),
    ],
    { url: `${config.appUrl}/recipes/${input.recipeId}`, label: 'Open the recipe' },
    'You receive this because you are an owner of the brewery. Turn review e-mails off in Profile.',
  );
}

export function reviewDecisionMail(input: {
  recipeName: string;
  version: number;
  owner: string;
  approved: boolean;
  comment: string;
  recipeId: number;
}): Rendered {
  return render(
    `${input.approved ? 'Approved' : 'Changes asked'}: ${input.recipeName} v${input.version}`,
    [
      input.approved
        ? `${input.owner} approved version ${input.version} of ${input.recipeName} for production.`
        : `${input.owner} returned version ${input.version} of ${input.recipeName} with changes to make.`,
      ...(input.comment ? [`"${input.comment}"`] : []),
    ],
    { url: `${config.appUrl}/recipes/${input.recipeId}`, label: 'Open the recipe' },
    'You receive this because you submitted the version. Turn review e-mails off in Profile.',
  );
}

export function batchDangerMail(input: {
  lotCode: string;
  recipeName: string;
  message: string;
  by: string;
  batchId: number;
}): Rendered {
  return render(
    `Danger reading: ${input.lotCode} (${input.recipeName})`,
    [`${input.by} recorded a danger reading on batch ${input.lotCode} of ${input.recipeName}.`, input.message],
    { url: `${config.appUrl}/batches/${input.batchId}`, label: 'Open the batch' },
    'You receive this because you decide on the brewery’s batches. Turn these e-mails off in Profile.',
  );
}

export function batchWaitingMail(input: { lotCode: string; recipeName: string; batchId: number }): Rendered {
  return render(
    `Batch waits for your decision: ${input.lotCode}`,
    [
      `Every step of batch ${input.lotCode} (${input.recipeName}) is signed off. It waits for an owner to release, hold or discard it.`,
    ],
    { url: `${config.appUrl}/batches/${input.batchId}`, label: 'Decide on the batch' },
    'You receive this because you decide on the brewery’s batches. Turn these e-mails off in Profile.',
  );
}
