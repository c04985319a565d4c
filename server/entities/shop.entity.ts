import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** The workshop that runs this installation: its identity appears on quotes and mails. */
@Entity({ name: 'shop' })
export class Shop {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text' })
  address!: string;

  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'text' })
  phone!: string;

  /** ISO 4217 code; every amount is stored in integer minor units of it. */
  @Column({ type: 'text', length: 3 })
  currency!: string;
}
