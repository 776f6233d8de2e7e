import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Role } from '../../../shared/src/roles.js';
import type { Preferences } from '../../../shared/src/schemas/auth.schema.js';

@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** Stored lower-case; unique. */
  @Index('users_email_key', { unique: true })
  @Column({ type: 'text' })
  email: string;

  @Column({ type: 'text' })
  name: string;

  /** bcrypt of the SHA-256 of the password; null until an invitation is accepted. */
  @Column({ name: 'password_hash', type: 'text', nullable: true })
  passwordHash: string | null;

  @Index('users_role_idx')
  @Column({ type: 'text' })
  role: Role;

  /** True: every site, including sites added later. */
  @Column({ name: 'all_sites', type: 'boolean', default: false })
  allSites: boolean;

  @Column({ name: 'site_ids', type: 'uuid', array: true, default: () => "'{}'" })
  siteIds: string[];

  /** Last day (inclusive, UTC) the user may sign in; null for no limit. */
  @Column({ name: 'access_expires_on', type: 'date', nullable: true })
  accessExpiresOn: string | null;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  /** Raised to end every session of the user at once. */
  @Column({ name: 'session_version', type: 'integer', default: 1 })
  sessionVersion: number;

  @Column({ type: 'jsonb', default: () => "'{}'" })
  preferences: Partial<Preferences>;

  @Column({ name: 'last_sign_in_at', type: 'timestamptz', nullable: true })
  lastSignInAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
