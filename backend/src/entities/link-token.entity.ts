import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type LinkTokenPurpose = 'invite' | 'reset';

/** A single-use link sent by e-mail. Only the SHA-256 of the token is kept. */
@Entity({ name: 'link_tokens' })
export class LinkToken {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('link_tokens_user_id_idx')
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @Column({ type: 'text' })
  purpose: LinkTokenPurpose;

  @Index('link_tokens_token_hash_key', { unique: true })
  @Column({ name: 'token_hash', type: 'text' })
  tokenHash: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'used_at', type: 'timestamptz', nullable: true })
  usedAt: Date | null;
}
