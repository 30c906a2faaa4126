import type { UserEntity } from './user.entity.js';

/** A user as other records name them (who created, wrote or approved something); null where the account is gone. */
export interface UserRefDto {
  id: string;
  displayName: string;
}

export function toUserRef(user: UserEntity | null | undefined): UserRefDto | null {
  return user ? { id: user.id, displayName: user.displayName } : null;
}
