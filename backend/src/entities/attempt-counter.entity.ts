import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Failed attempts per key ("sign-in:account:<email>", "sign-in:address:<ip>", …), shared by every server instance. */
@Entity({ name: 'attempt_counters' })
export class AttemptCounter {
  @PrimaryColumn({ type: 'text' })
  key: string;

  @Column({ type: 'integer', default: 0 })
  count: number;

  @Column({ name: 'window_started_at', type: 'timestamptz' })
  windowStartedAt: Date;

  @Column({ name: 'last_at', type: 'timestamptz' })
  lastAt: Date;
}
