import * as yup from 'yup';

import { numberField } from './numbers';

const comment = (required: string | null) => {
  const base = yup.string().trim().max(2000, 'Keep it under 2,000 characters.');
  return required ? base.min(1, required).required(required) : base.default('');
};

export const submitSchema = yup.object({
  version: numberField('Version').integer().positive().required('Say which version you submit.'),
  message: comment(null),
});

export const approveSchema = yup.object({
  /** The version the owner looked at: approval is refused if the recipe changed since. */
  version: numberField('Version').integer().positive().required('Say which version you approve.'),
  comment: comment(null),
  overrideReason: yup.string().trim().max(2000, 'Keep it under 2,000 characters.').nullable().default(null),
});

export const returnSchema = yup.object({
  version: numberField('Version').integer().positive().required('Say which version you return.'),
  comment: comment('Say what needs to change.'),
});

export const withdrawSchema = yup.object({ reason: comment('Give the reason for withdrawing the approval.') });

export type SubmitInput = yup.InferType<typeof submitSchema>;
export type ApproveInput = yup.InferType<typeof approveSchema>;
export type ReturnInput = yup.InferType<typeof returnSchema>;
export type WithdrawInput = yup.InferType<typeof withdrawSchema>;

export type ReviewState = 'draft' | 'submitted' | 'approved' | 'returned';
export const REVIEW_STATE_LABELS: Record<ReviewState, string> = {
  draft: 'Draft',
  submitted: 'Waiting for review',
  approved: 'Approved for production',
  returned: 'Changes asked',
};
