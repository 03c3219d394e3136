import { useMutation, useQueryClient } from '@tanstack/react-query';
import { personResponse, type SetRoleRequest } from '@server/contracts/admin-users.ts';
import { apiRequest } from '@ui/api-client.ts';
import { peopleQuery } from './get-people.ts';

export const setRole = (id: number, role: SetRoleRequest['role']) =>
  apiRequest(`/admin/users/${id}/role`, personResponse, { method: 'PUT', body: { role } });

export function useSetRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: number; role: SetRoleRequest['role'] }) => setRole(id, role),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleQuery().queryKey.slice(0, 2) }),
  });
}
