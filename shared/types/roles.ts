/** Who an account belongs to: a rider, the service desk, the parts counter or the shop's owner. */
export const ROLES = ['rider', 'desk', 'counter', 'admin'] as const;

export type Role = (typeof ROLES)[number];
