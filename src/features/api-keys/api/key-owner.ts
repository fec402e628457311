/** Whose keys a request is about: one organisation's (its owners and members) or every key (admins). */
export type KeyOwner = { organisationId: string } | { admin: true };

/** The first-party base of a key owner's routes (see server/routes/route-access.ts). */
export function ownerBase(owner: KeyOwner): string {
  return 'admin' in owner ? '/api/admin' : `/api/organisations/${encodeURIComponent(owner.organisationId)}`;
}

export function ownerKey(owner: KeyOwner): string {
  return 'admin' in owner ? 'admin' : owner.organisationId;
}

export const keysQueryKey = (owner: KeyOwner) => ['api-keys', ownerKey(owner), 'keys'] as const;
export const usageQueryKey = (owner: KeyOwner) => ['api-keys', ownerKey(owner), 'usage'] as const;
