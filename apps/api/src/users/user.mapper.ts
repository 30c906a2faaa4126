import type { UserDto } from './dto/user.dto.js';
import type { UserEntity } from './user.entity.js';

export function toUserDto(user: UserEntity): UserDto {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    roles: user.roles,
    active: user.active,
    version: user.version,
    createdAt: user.createdAt.toISOString(),
    updatedAt: user.updatedAt.toISOString(),
  };
}
