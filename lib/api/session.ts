import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type {
  AcceptInvitationInput,
  ConfirmSignUpInput,
  ForgotPasswordInput,
  ResetPasswordInput,
  SignInInput,
  SignUpInput,
} from '@/lib/schemas/auth';
import type { ChangePasswordInput, OrganisationInput, PreferencesInput, ProfileInput } from '@/lib/schemas/team';
import type { UnitSystem } from '@/lib/units';

import { api, ApiError } from './client';
import { staleTimes } from './query-client';
import type { InvitationPreview, ServerInfo, Session } from './types';

export const sessionKeys = {
  current: ['session'] as const,
  invitation: (token: string) => ['invitation', token] as const,
  serverInfo: ['server-info'] as const,
};

/** The signed-in session, or null when nobody is signed in. */
export function useSessionQuery() {
  return useQuery({
    queryKey: sessionKeys.current,
    staleTime: staleTimes.session,
    queryFn: async ({ signal }) => {
      try {
        return await api.get<Session>('/auth/session', signal);
      } catch (error) {
        if (error instanceof ApiError && error.status === 401) return null;
        throw error;
      }
    },
  });
}

/** Server facts the client needs (version, whether mail goes to the local outbox). */
export function useServerInfoQuery() {
  return useQuery({
    queryKey: sessionKeys.serverInfo,
    staleTime: staleTimes.static,
    queryFn: ({ signal }) => api.get<ServerInfo>('/health', signal),
  });
}

/**
 * Replaces who is signed in: drops everything cached for the previous person but keeps the session query
 * itself (screens are subscribed to it), so they re-render with the new value at once.
 */
function useReplaceSession() {
  const queryClient = useQueryClient();
  return (session: Session | null) => {
    queryClient.setQueryData(sessionKeys.current, session);
    queryClient.removeQueries({
      predicate: (query) =>
        query.queryKey[0] !== sessionKeys.current[0] && query.queryKey[0] !== sessionKeys.serverInfo[0],
    });
  };
}

export function useSignInMutation() {
  const start = useReplaceSession();
  return useMutation({
    mutationFn: (input: SignInInput) => api.post<Session>('/auth/sign-in', input),
    onSuccess: start,
  });
}

/** Starts a sign-up; the account exists once the link e-mailed to the address is followed. */
export function useSignUpMutation() {
  return useMutation({ mutationFn: (input: SignUpInput) => api.post<{ message: string }>('/auth/sign-up', input) });
}

export function useConfirmSignUpMutation() {
  const start = useReplaceSession();
  return useMutation({
    mutationFn: (input: ConfirmSignUpInput) => api.post<Session>('/auth/confirm-sign-up', input),
    onSuccess: start,
  });
}

export function useSignOutMutation() {
  const replace = useReplaceSession();
  return useMutation({ mutationFn: () => api.post<void>('/auth/sign-out'), onSuccess: () => replace(null) });
}

export function useForgotPasswordMutation() {
  return useMutation({
    mutationFn: (input: ForgotPasswordInput) => api.post<{ message: string }>('/auth/forgot-password', input),
  });
}

export function useResetPasswordMutation() {
  const start = useReplaceSession();
  return useMutation({
    mutationFn: (input: ResetPasswordInput) => api.post<Session>('/auth/reset-password', input),
    onSuccess: start,
  });
}

export function useInvitationQuery(token: string | undefined) {
  return useQuery({
    queryKey: sessionKeys.invitation(token ?? ''),
    enabled: Boolean(token),
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<InvitationPreview>(`/auth/invitations/${encodeURIComponent(token ?? '')}`, signal),
  });
}

export function useAcceptInvitationMutation() {
  const start = useReplaceSession();
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) => api.post<Session>('/auth/accept-invitation', input),
    onSuccess: start,
  });
}

export function useUpdateProfileMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ProfileInput) => api.patch<Session>('/profile', input),
    onSuccess: (session) => queryClient.setQueryData(sessionKeys.current, session),
  });
}

/** Saves a preference such as the unit system; the screen switches at once, before the server answers. */
export function useUpdatePreferencesMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PreferencesInput) => api.patch<Session>('/profile/preferences', input),
    onMutate: (input) => {
      const previous = queryClient.getQueryData<Session | null>(sessionKeys.current);
      if (previous)
        queryClient.setQueryData(sessionKeys.current, { ...previous, user: { ...previous.user, ...input } });
      return { previous };
    },
    onError: (_error, _input, context) => queryClient.setQueryData(sessionKeys.current, context?.previous),
    onSuccess: (session) => queryClient.setQueryData(sessionKeys.current, session),
  });
}

export function useUpdateOrganisationMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OrganisationInput) => api.patch<Session>('/organisation', input),
    onSuccess: (session) => queryClient.setQueryData(sessionKeys.current, session),
  });
}

export function useChangePasswordMutation() {
  return useMutation({ mutationFn: (input: ChangePasswordInput) => api.post<Session>('/profile/password', input) });
}

/** The currency the brewery keeps its costs in (US dollars until an owner chooses another). */
export function useBreweryCurrency(): string {
  return useSessionQuery().data?.organisation.currency ?? 'USD';
}

/** The signed-in person's units (metric until they choose US). */
export function useUnitSystem(): UnitSystem {
  return useSessionQuery().data?.user.unitSystem ?? 'metric';
}
