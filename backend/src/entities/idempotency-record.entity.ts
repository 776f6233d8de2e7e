import { Column, Entity, PrimaryColumn } from 'typeorm';

/** The stored answer of a field submission, so a retried request is answered without being done twice. */
@Entity({ name: 'idempotency_records' })
export class IdempotencyRecord {
  /** The user's id and the client's key: one key never crosses users. */
  @PrimaryColumn({ type: 'text' })
  key: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @Column({ type: 'text' })
  action: string;

  @Column({ name: 'request_hash', type: 'text' })
  requestHash: string;

  @Column({ name: 'response_status', type: 'integer' })
  responseStatus: number;

  @Column({ name: 'response_body', type: 'jsonb' })
  responseBody: unknown;

  @Column({ name: 'created_at', type: 'timestamptz', default: () => 'now()' })
  createdAt: Date;
}
