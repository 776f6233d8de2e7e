import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { EventKind } from '../../../shared/src/schemas/assemblies.schema.js';

/**
 * Something that happened to an assembly, at its position when it had one. Append-only: a
 * correction is a new `void` event naming the voided one and the reason.
 */
@Entity({ name: 'assembly_events' })
@Index('assembly_events_assembly_idx', ['assemblyId', 'occurredAt'])
@Index('assembly_events_position_idx', ['positionId', 'occurredAt'])
export class AssemblyEvent {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'assembly_id', type: 'uuid' })
  assemblyId: string;

  @Column({ name: 'position_id', type: 'uuid', nullable: true })
  positionId: string | null;

  @Index('assembly_events_site_id_idx')
  @Column({ name: 'site_id', type: 'uuid' })
  siteId: string;

  @Column({ type: 'text' })
  kind: EventKind;

  /** When it happened in the plant (may be before it was recorded). */
  @Column({ name: 'occurred_at', type: 'timestamptz' })
  occurredAt: Date;

  @Column({ name: 'occurred_at_estimated', type: 'boolean', default: false })
  occurredAtEstimated: boolean;

  @Column({ name: 'recorded_at', type: 'timestamptz', default: () => 'now()' })
  recordedAt: Date;

  @Column({ name: 'actor_id', type: 'uuid', nullable: true })
  actorId: string | null;

  @Column({ name: 'work_order', type: 'text', nullable: true })
  workOrder: string | null;

  @Column({ name: 'hour_meter_hours', type: 'double precision', nullable: true })
  hourMeterHours: number | null;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ type: 'jsonb', default: () => "'{}'" })
  data: Record<string, unknown>;

  /** For a `void` event: the event it voids. */
  @Index('assembly_events_voids_idx', { unique: true, where: 'voids_event_id IS NOT NULL' })
  @Column({ name: 'voids_event_id', type: 'uuid', nullable: true })
  voidsEventId: string | null;
}
