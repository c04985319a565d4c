import useSWR, { useSWRConfig } from 'swr';

import { api, type ApiError } from '@/api/client';
import { keys } from '@/api/keys';
import type { StaffCreateInput, UserSearchInput } from '@shared/schemas/auth.schema';
import type { AccountUser, UserPage } from '@shared/types/account';
import type { Role } from '@shared/types/roles';

/** One page of the admin's user list. The previous page stays in view while the next loads. */
export function useUsers(search: UserSearchInput) {
  return useSWR<UserPage, ApiError>(keys.users(search), (path: string) => api.get<UserPage>(path), {
    keepPreviousData: true,
  });
}

type UserAnswer = { user: AccountUser };

/** The admin's changes to accounts; each refreshes every loaded page of the list once it lands. */
export function useUserChanges() {
  const { mutate } = useSWRConfig();
  const refreshLists = () => mutate(keys.isUsers);

  async function change(request: Promise<UserAnswer>): Promise<AccountUser> {
    const { user } = await request;
    await refreshLists();
    return user;
  }

  return {
    changeRole: (id: number, role: Role) => change(api.patch<UserAnswer>(`/users/${id}/role`, { role })),
    setActive: (id: number, active: boolean) =>
      change(api.patch<UserAnswer>(`/users/${id}/active`, { active })),
    createStaff: (input: StaffCreateInput) => change(api.post<UserAnswer>('/users', input)),
  };
}
