import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique, type Relation } from 'typeorm';
import { InstantColumn } from '../columns.js';
import { User } from './user.entity.js';

export const LINK_PURPOSES = ['invitation', 'reset'] as const;
export type LinkPurpose = (typeof LINK_PURPOSES)[number];

/** A one-time link to set a password, mailed to the person; only its token's SHA-256 is kept. */
@Entity('password_links')
@Unique('uq_password_links_token_hash', ['tokenHash'])
export class PasswordLink {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ name: 'user_id' })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<User>;

  @Column({ type: 'varchar', length: 12 })
  purpose: LinkPurpose;

  @Column({ name: 'token_hash', type: 'char', length: 64 })
  tokenHash: string;

  @InstantColumn({ name: 'expires_at' })
  expiresAt: Date;

  /** Set when the link is used; it never works again. */
  @InstantColumn({ name: 'used_at', nullable: true })
  usedAt: Date | null;

  @InstantColumn({ name: 'created_at' })
  createdAt: Date;
}
