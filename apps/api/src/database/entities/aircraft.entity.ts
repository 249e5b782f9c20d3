import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { AircraftType } from './aircraft-type.entity.js';
import { Ship } from './ship.entity.js';
import { Squadron } from './squadron.entity.js';

@Entity('aircraft')
export class Aircraft {
  @PrimaryGeneratedColumn()
  id: number;

  /** The ship whose data this is (its squadron's and type's ship): only its people (and fleet admins) read or change it. */
  @Column({ name: 'ship_id' })
  shipId: number;

  @ManyToOne(() => Ship, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ship_id' })
  ship: Relation<Ship>;

  @Index({ unique: true })
  @Column({ name: 'side_number', length: 8 })
  sideNumber: string;

  @Column({ name: 'type_id' })
  typeId: number;

  @ManyToOne(() => AircraftType, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'type_id' })
  type: Relation<AircraftType>;

  @Column({ name: 'squadron_id' })
  squadronId: number;

  @ManyToOne(() => Squadron, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'squadron_id' })
  squadron: Relation<Squadron>;

  /** Deck spot name from the ship's deck spots. */
  @Column({ name: 'parked_spot', length: 20 })
  parkedSpot: string;

  @Column({ default: true })
  serviceable: boolean;

  @Column({ name: 'catapult_shots', default: 0 })
  catapultShots: number;
}
