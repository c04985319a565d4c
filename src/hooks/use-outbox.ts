/**
 * The development server's outbox: the mails the app would have sent, kept by the server's local
 * SMTP stand-in. Admin only, and absent (404) on a production server.
 */
import useSWR from 'swr';

import { api, type ApiError } from '@/api/client';
import { keys } from '@/api/keys';

/** One mail in the list, as `GET /api/dev/outbox` answers it. */
export type OutboxEntry = {
  id: string;
  from: string;
  /** Envelope recipients. */
  to: string[];
  subject: string;
  /** ISO 8601, when the stand-in received it. */
  date: string;
};

export type OutboxMail = OutboxEntry & { text: string | null; html: string | null };

/** Newest first. */
export function useOutbox() {
  return useSWR<OutboxEntry[], ApiError>(keys.outbox, async (path: string) => {
    const { mails } = await api.get<{ mails: OutboxEntry[] }>(path);
    return mails;
  });
}

/** One mail in full; nothing is fetched while `id` is undefined. */
export function useOutboxMail(id: string | undefined) {
  return useSWR<OutboxMail, ApiError>(id ? keys.outboxMail(id) : null, async (path: string) => {
    const { mail } = await api.get<{ mail: OutboxMail }>(path);
    return mail;
  });
}
