import type { Role } from '@catline/contracts';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { CreatedAtColumn, UpdatedAtColumn } from '../columns.js';
import { Catapult } from './catapult.entity.js';
import { Ship } from './ship.entity.js';
import { Squadron } from './squadron.entity.js';

@Entity('users')
export class User {
  @PrimaryGeneratedColumn()
  id: number;

  @Index({ unique: true })
  @Column({ length: 254 })
  email: string;

  @Column({ length: 120 })
  name: string;

  /** argon2id; null until an invited person sets a password. */
  @Column({ name: 'password_hash', type: 'varchar', length: 255, nullable: true })
  passwordHash: string | null;

  @Column({ type: 'varchar', length: 20 })
  role: Role;

  /** The ship the person serves on; null only for a fleet admin, who works on every ship. */
  @Column({ name: 'ship_id', type: 'int', nullable: true })
  shipId: number | null;

  @ManyToOne(() => Ship, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ship_id' })
  ship: Relation<Ship> | null;

  /** The catapult a catapult officer runs now. */
  @Column({ name: 'catapult_id', type: 'int', nullable: true })
  catapultId: number | null;

  @ManyToOne(() => Catapult, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'catapult_id' })
  catapult: Relation<Catapult> | null;

  @Column({ name: 'squadron_id', type: 'int', nullable: true })
  squadronId: number | null;

  @ManyToOne(() => Squadron, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'squadron_id' })
  squadron: Relation<Squadron> | null;

  @Column({ default: true })
  active: boolean;

  /** Bumped on password change, logout everywhere or removal: older tokens stop working. */
  @Column({ name: 'token_version', default: 0 })
  tokenVersion: number;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
