import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { AuditEntity } from '../../shared/schemas/shop-data.schema';
import type { AuditAction } from '../../shared/types/shop-data';

/** One edit of the shop's data (a bike model, a target profile, an engine setting, the shop settings): who, when, before and after. */
@Entity({ name: 'audit_entry' })
@Index('idx_audit_entry_entity', ['entity', 'id'])
export class AuditEntry {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'datetime' })
  at!: Date;

  @Column({ type: 'integer', nullable: true })
  actorId!: number | null;

  /** As the account was named then, so the row reads the same after a rename. */
  @Column({ type: 'text' })
  actorName!: string;

  @Column({ type: 'text' })
  entity!: AuditEntity;

  @Column({ type: 'text' })
  entityKey!: string;

  @Column({ type: 'text' })
  action!: AuditAction;

  @Column({ type: 'simple-json', nullable: true })
  before!: object | null;

  @Column({ type: 'simple-json', nullable: true })
  after!: object | null;
}
