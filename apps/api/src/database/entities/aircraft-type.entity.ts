import type { AircraftClass, LaunchTableRow, SettingTable, StoresItem, TrimBand } from '@catline/contracts';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Ship } from './ship.entity.js';

/** A type's launch data as the ship's approved data gives it; entered by the user. */
@Entity('aircraft_types')
export class AircraftType {
  @PrimaryGeneratedColumn()
  id: number;

  /** The ship whose data this is: only its people (and fleet admins) read or change it. */
  @Column({ name: 'ship_id' })
  shipId: number;

  @ManyToOne(() => Ship, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ship_id' })
  ship: Relation<Ship>;

  @Index({ unique: true })
  @Column({ length: 20 })
  designation: string;

  @Column({ length: 120 })
  name: string;

  /** Which of the ship profile's departures its aircraft fly. */
  @Column({ name: 'aircraft_class', type: 'varchar', length: 12, default: 'jet' })
  aircraftClass: AircraftClass;

  @Column({ name: 'max_gross_weight_lb' })
  maxGrossWeightLb: number;

  /** With crew, empty of fuel and stores; null until entered, and then no gross weight is built up. */
  @Column({ name: 'operating_weight_lb', type: 'int', nullable: true })
  operatingWeightLb: number | null;

  @Column({ name: 'crosswind_limit_kt', type: 'double' })
  crosswindLimitKt: number;

  @Column({ name: 'thrust_lbf' })
  thrustLbf: number;

  @Column({ name: 'required_excess_kt', type: 'double' })
  requiredExcessKt: number;

  @Column({ name: 'afterburner_from_lb', type: 'int', nullable: true })
  afterburnerFromLb: number | null;

  /** Overstress limit, knots; null only for a type entered before the field existed (no shot is allowed). */
  @Column({ name: 'max_end_speed_kt', type: 'double', nullable: true })
  maxEndSpeedKt: number | null;

  /** The holdback release element the type is launched with, as marked on it; null until entered. */
  @Column({ name: 'holdback_element', type: 'varchar', length: 20, nullable: true })
  holdbackElement: string | null;

  @Column({ name: 'trim_bands', type: 'json' })
  trimBands: TrimBand[];

  /** Minimum launch airspeed by gross weight, ordered by increasing weight. */
  @Column({ name: 'launch_table', type: 'json' })
  launchTable: LaunchTableRow[];

  /** What an aircraft of the type can carry, ordered by name; names unique regardless of case. */
  @Column({ name: 'stores_catalogue', type: 'json' })
  storesCatalogue: StoresItem[];

  /** The approved catapult settings, one table per catapult and configuration, ordered as the view lists them. */
  @Column({ name: 'setting_tables', type: 'json' })
  settingTables: SettingTable[];
}
