import type { CatapultPosition, CatapultStatus, ReadinessStep } from '@catline/contracts';
import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique, type Relation } from 'typeorm';
import { Ship } from './ship.entity.js';

@Entity('catapults')
@Unique('uq_catapults_ship_number', ['shipId', 'number'])
export class Catapult {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ name: 'ship_id' })
  shipId: number;

  @ManyToOne(() => Ship, (ship) => ship.catapults, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'ship_id' })
  ship: Relation<Ship>;

  @Column({ type: 'tinyint' })
  number: number;

  @Column({ type: 'varchar', length: 5 })
  position: CatapultPosition;

  /** Degrees from the ship's heading; negative to port. */
  @Column({ name: 'axis_angle_deg', type: 'double' })
  axisAngleDeg: number;

  @Column({ name: 'stroke_m', type: 'double' })
  strokeM: number;

  @Column({ name: 'energy_min_mj', type: 'double' })
  energyMinMj: number;

  @Column({ name: 'energy_max_mj', type: 'double' })
  energyMaxMj: number;

  @Column({ name: 'setting_count', type: 'smallint' })
  settingCount: number;

  @Column({ name: 'reset_interval_s' })
  resetIntervalS: number;

  @Column({ type: 'tinyint' })
  pair: number;

  @Column({ type: 'varchar', length: 4, default: 'up' })
  status: CatapultStatus;

  @Column({ name: 'shot_count', default: 0 })
  shotCount: number;

  /** Null: the catapult runs the ship's readiness steps. */
  @Column({ name: 'readiness_steps', type: 'json', nullable: true })
  readinessSteps: ReadinessStep[] | null;
}
