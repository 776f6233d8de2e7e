import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Who changed what, when; append-only (a database trigger refuses updates and deletes). */
@Entity({ name: 'audit_entries' })
@Index('audit_entries_entity_idx', ['entityType', 'entityId', 'at'])
export class AuditEntry {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('audit_entries_at_idx')
  @Column({ type: 'timestamptz', default: () => 'now()' })
  at: Date;

  @Column({ name: 'actor_id', type: 'uuid', nullable: true })
  actorId: string | null;

  @Column({ type: 'text' })
  action: string;

  @Column({ name: 'entity_type', type: 'text' })
  entityType: string;

  @Column({ name: 'entity_id', type: 'uuid', nullable: true })
  entityId: string | null;

  @Index('audit_entries_site_id_idx')
  @Column({ name: 'site_id', type: 'uuid', nullable: true })
  siteId: string | null;

  @Column({ type: 'jsonb', nullable: true })
  before: object | null;

  @Column({ type: 'jsonb', nullable: true })
  after: object | null;
}
