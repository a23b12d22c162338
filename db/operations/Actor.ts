export type Role = 'viewer' | 'technician' | 'admin';

/** Who is calling: the lab their key belongs to decides every record they can see. */
export interface Actor {
  labId: string;
  keyId: string;
  role: Role;
}

const RANK: Record<Role, number> = { viewer: 0, technician: 1, admin: 2 };

export function roleAtLeast(role: Role, needed: Role): boolean {
  return RANK[role] >= RANK[needed];
}
