import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One mailed reset link. Only the SHA-256 of its token is kept, so a copy of the database cannot reset anyone. */
@Entity({ name: 'password_reset' })
export class PasswordReset {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Index('idx_password_reset_user')
  @Column({ type: 'integer' })
  userId!: number;

  /** Hex SHA-256 of the token in the link. */
  @Index('uq_password_reset_token', { unique: true })
  @Column({ type: 'text' })
  tokenHash!: string;

  @Column({ type: 'datetime' })
  createdAt!: Date;

  @Column({ type: 'datetime' })
  expiresAt!: Date;

  @Column({ type: 'datetime', nullable: true })
  usedAt!: Date | null;
}
