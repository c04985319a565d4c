/** What `GET /api/health` answers. */
export interface Health {
  ok: boolean;
  version: string;
  database: { ok: boolean; sqlite?: string };
}
