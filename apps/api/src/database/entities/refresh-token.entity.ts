import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { CreatedAtColumn, InstantColumn } from '../columns.js';
import { User } from './user.entity.js';

/**
 * One live refresh token per session; only its SHA-256 is kept, and each use replaces it with a row of the
 * same session. A sign-in starts a session; its id is in every access token of that session.
 */
@Entity('refresh_tokens')
export class RefreshToken {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ name: 'user_id' })
  userId: number;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<User>;

  @Index('ix_refresh_tokens_session')
  @Column({ name: 'session_id', type: 'char', length: 36 })
  sessionId: string;

  @Index({ unique: true })
  @Column({ name: 'token_hash', type: 'char', length: 64 })
  tokenHash: string;

  @InstantColumn({ name: 'expires_at' })
  expiresAt: Date;

  @InstantColumn({ name: 'revoked_at', nullable: true })
  revokedAt: Date | null;

  @CreatedAtColumn()
  createdAt: Date;
}
