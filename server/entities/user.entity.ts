import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { Role } from '../../shared/types/roles';

/** A person who signs in. The e-mail is stored lower-case, so the unique index is case-insensitive. */
@Entity({ name: 'user' })
export class User {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Index('uq_user_email', { unique: true })
  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text' })
  role!: Role;

  /** argon2id PHC string. */
  @Column({ type: 'text' })
  passwordHash!: string;

  @Column({ type: 'boolean', default: true })
  active!: boolean;

  /** Carried in every token; raising it revokes every token issued before. */
  @Column({ type: 'integer', default: 0 })
  tokenVersion!: number;

  @Column({ type: 'datetime' })
  createdAt!: Date;

  @Column({ type: 'datetime', nullable: true })
  lastSignInAt!: Date | null;
}
