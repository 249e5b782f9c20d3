import type {
  CatapultDeckHold,
  CycleState,
  LaunchPrerequisiteTick,
  LandingAreaState,
  RespotView,
  WeatherCase,
} from '@catline/contracts';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique, type Relation } from 'typeorm';
import { CreatedAtColumn, InstantColumn, UpdatedAtColumn } from '../columns.js';
import { Ship } from './ship.entity.js';

@Entity('cycles')
@Unique('uq_cycles_ship_number', ['shipId', 'number'])
export class Cycle {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ name: 'ship_id' })
  shipId: number;

  @ManyToOne(() => Ship, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ship_id' })
  ship: Relation<Ship>;

  @Column()
  number: number;

  @InstantColumn({ name: 'planned_launch_at' })
  plannedLaunchAt: Date;

  @InstantColumn({ name: 'window_start_at' })
  windowStartAt: Date;

  @InstantColumn({ name: 'window_end_at' })
  windowEndAt: Date;

  @Column({ name: 'ship_course_deg', type: 'double' })
  shipCourseDeg: number;

  @Column({ name: 'ship_speed_kt', type: 'double' })
  shipSpeedKt: number;

  @Column({ name: 'true_wind_from_deg', type: 'double' })
  trueWindFromDeg: number;

  @Column({ name: 'true_wind_speed_kt', type: 'double' })
  trueWindSpeedKt: number;

  /** The gust and the lull of the wind reading as true winds (a reading without a spread: the steady wind). */
  @Column({ name: 'wind_gust_from_deg', type: 'double' })
  windGustFromDeg: number;

  @Column({ name: 'wind_gust_kt', type: 'double' })
  windGustKt: number;

  @Column({ name: 'wind_lull_from_deg', type: 'double' })
  windLullFromDeg: number;

  @Column({ name: 'wind_lull_kt', type: 'double' })
  windLullKt: number;

  /** When the wind reading in force was taken: the change that entered it. */
  @InstantColumn({ name: 'wind_read_at', default: () => 'CURRENT_TIMESTAMP(3)' })
  windReadAt: Date;

  /** The ship's position for the cycle; with it, night follows the sun at the planned launch. */
  @Column({ name: 'latitude_deg', type: 'double', nullable: true })
  latitudeDeg: number | null;

  @Column({ name: 'longitude_deg', type: 'double', nullable: true })
  longitudeDeg: number | null;

  @Column({ name: 'temperature_c', type: 'double' })
  temperatureC: number;

  @Column({ name: 'pressure_hpa', type: 'double', default: 1013.25 })
  pressureHpa: number;

  @Column({ name: 'weather_case', type: 'varchar', length: 3 })
  weatherCase: WeatherCase;

  @Column({ default: false })
  night: boolean;

  @Column({ name: 'landing_area', type: 'varchar', length: 10, default: 'clear' })
  landingArea: LandingAreaState;

  @Column({ name: 'landing_area_reason', type: 'varchar', length: 200, nullable: true })
  landingAreaReason: string | null;

  /** The catapults the air boss holds (deck not clear), with why; null or empty when every catapult is clear. */
  @Column({ name: 'deck_holds', type: 'json', nullable: true })
  deckHolds: CatapultDeckHold[] | null;

  /** The launch prerequisites the air boss ticked for this cycle, by name; null or empty when none. */
  @Column({ name: 'prerequisite_ticks', type: 'json', nullable: true })
  prerequisiteTicks: LaunchPrerequisiteTick[] | null;

  /** The respot the handler built after the last launch, with its tows as the deck crew ticks them off. */
  @Column({ type: 'json', nullable: true })
  respot: RespotView | null;

  @Column({ type: 'varchar', length: 10, default: 'planning' })
  state: CycleState;

  /**
   * The ship's id while this cycle launches, else null: its unique index lets one cycle per ship launch,
   * whatever two starts racing on two cycles each checked (many rows may hold null).
   */
  @Index('uq_cycles_launching_ship', { unique: true })
  @Column({
    name: 'launching_ship_id',
    type: 'int',
    nullable: true,
    generatedType: 'STORED',
    asExpression: "case when `state` = 'executing' then `ship_id` end",
    insert: false,
    update: false,
    select: false,
  })
  launchingShipId: number | null;

  /** Bumped by one in the transaction of every accepted change; orders the change log. */
  @Column({ default: 0 })
  version: number;

  @CreatedAtColumn()
  createdAt: Date;

  @UpdatedAtColumn()
  updatedAt: Date;
}
