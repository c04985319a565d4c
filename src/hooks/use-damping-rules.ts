import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { dampingRuleKeys } from '@/api/keys';
import type { DampingRuleCreateInput, DampingRulePatchInput } from '@shared/schemas/damping.schema';
import type { DampingRuleAnswer, DampingRuleList } from '@shared/types/test-ride';

/**
 * The symptom-to-change table the test-ride loop reads: the desk and the admin list it and add
 * the shop's own rows; only the admin edits a row or switches it off (the server refuses others).
 */
export function useDampingRules() {
  const swr = useSWR<DampingRuleList, ApiError>(dampingRuleKeys.rules, (path: string) => api.get<DampingRuleList>(path));
  // The list is read again after a write: a row moved in its group's order moves the others too.
  async function create(input: DampingRuleCreateInput) {
    const { rule } = await api.post<DampingRuleAnswer>(dampingRuleKeys.rules, input);
    await swr.mutate();
    return rule;
  }
  async function update(id: number, patch: DampingRulePatchInput) {
    const { rule } = await api.patch<DampingRuleAnswer>(dampingRuleKeys.rule(id), patch);
    await swr.mutate();
    return rule;
  }
  return { ...swr, create, update };
}
