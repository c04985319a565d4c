import type { Role } from '../../shared/types/roles';

/** Who is calling, as `req.user` holds it. */
export interface AuthUser {
  id: number;
  role: Role;
  email: string;
  name: string;
}
