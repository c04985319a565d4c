/** The two halves of a password reset: ask for a mailed link, then choose a password with it. */
import { api } from '@/api/client';
import type { ResetInput, ResetRequestInput } from '@shared/schemas/auth.schema';

/** Resolves with the server's message, the same whether or not an account uses the e-mail. */
export async function requestPasswordReset(input: ResetRequestInput): Promise<string> {
  const { message } = await api.post<{ message: string }>('/auth/reset-request', input);
  return message;
}

/** Signs the account out everywhere; the person then signs in with the new password. */
export function resetPassword(input: ResetInput): Promise<void> {
  return api.post<void>('/auth/reset', input);
}
