import type { DeckLayout, DeckSpot, ShipProfile } from '@catline/contracts';
import { Column, Entity, OneToMany, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Catapult } from './catapult.entity.js';

@Entity('ships')
export class Ship {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ length: 120 })
  name: string;

  @Column({ name: 'hull_code', length: 20 })
  hullCode: string;

  /** Minimum time between launches of the two catapults of a pair, seconds. */
  @Column({ name: 'pair_gap_s' })
  pairGapS: number;

  @Column({ type: 'json' })
  profile: ShipProfile;

  @Column({ name: 'deck_spots', type: 'json' })
  deckSpots: DeckSpot[];

  /** Elevators, hangar bays and the landing area's catapults; null for a ship with none given yet. */
  @Column({ name: 'deck_layout', type: 'json', nullable: true })
  deckLayout: DeckLayout | null;

  @OneToMany(() => Catapult, (catapult) => catapult.ship)
  catapults: Relation<Catapult>[];
}
