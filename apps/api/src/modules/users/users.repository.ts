import type { EntityManager } from 'typeorm';
import { UserEntity, type UserRow } from './user.entity';

export const usersRepository = (m: EntityManager) => m.getRepository<UserRow>(UserEntity);
