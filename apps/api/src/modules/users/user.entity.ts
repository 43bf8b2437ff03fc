import { EntitySchema } from 'typeorm';

export const ROLES = ['reader', 'contributor', 'curator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export interface UserRow {
  id: string;
  githubId: string;
  login: string;
  displayName: string;
  email: string | null;
  role: Role;
  createdAt: Date;
  lastSignInAt: Date | null;
}

// EntitySchema instead of decorators: tsx/esbuild and Vite's transformer handle decorators
// differently (docs/decisions/0001-entity-schemas.md).
export const UserEntity = new EntitySchema<UserRow>({
  name: 'User',
  tableName: 'users',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    githubId: { type: 'varchar', name: 'github_id', unique: true },
    login: { type: 'varchar', unique: true },
    displayName: { type: 'varchar', name: 'display_name' },
    email: { type: 'varchar', nullable: true },
    role: { type: 'varchar' },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    lastSignInAt: { type: 'timestamptz', name: 'last_sign_in_at', nullable: true },
  },
});
