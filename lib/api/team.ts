import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { Role } from '@/lib/roles';
import type { InviteInput } from '@/lib/schemas/team';

import { api } from './client';
import { outboxKeys } from './outbox';
import { staleTimes } from './query-client';
import type { Invitation, Member, Team } from './types';

export const teamKeys = {
  all: ['team'] as const,
};

export function useTeamQuery(enabled = true) {
  return useQuery({
    queryKey: teamKeys.all,
    enabled,
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<Team>('/team', signal),
  });
}

/** Team changes also put a message in the outbox (invitations), so both are refreshed. */
function useTeamMutation<TInput, TResult>(mutationFn: (input: TInput) => Promise<TResult>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: teamKeys.all }),
        queryClient.invalidateQueries({ queryKey: outboxKeys.all }),
      ]);
    },
  });
}

export const useInviteMutation = () =>
  useTeamMutation((input: InviteInput) => api.post<Invitation>('/team/invitations', input));
export const useResendInvitationMutation = () =>
  useTeamMutation((id: number) => api.post<Invitation>(`/team/invitations/${id}/resend`));
export const useRevokeInvitationMutation = () =>
  useTeamMutation((id: number) => api.delete<void>(`/team/invitations/${id}`));
export const useChangeRoleMutation = () =>
  useTeamMutation(({ id, role }: { id: number; role: Role }) => api.patch<Member>(`/team/members/${id}`, { role }));
export const useSetMemberActiveMutation = () =>
  useTeamMutation(({ id, active }: { id: number; active: boolean }) =>
    api.post<Member>(`/team/members/${id}/${active ? 'reactivate' : 'deactivate'}`),
  );
