import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { SelectionCheckCode } from '../../../shared/src/checks/types.js';

/** A competent person's acceptance of a failed check for one assembly at one position. Append-only. */
@Entity({ name: 'check_overrides' })
@Index('check_overrides_assembly_position_idx', ['assemblyId', 'positionId'])
export class CheckOverride {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'assembly_id', type: 'uuid' })
  assemblyId: string;

  @Column({ name: 'position_id', type: 'uuid' })
  positionId: string;

  @Column({ name: 'check_code', type: 'text' })
  checkCode: SelectionCheckCode;

  @Column({ type: 'text' })
  reason: string;

  @Column({ name: 'review_on', type: 'date' })
  reviewOn: string;

  @Column({ name: 'actor_id', type: 'uuid' })
  actorId: string;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
