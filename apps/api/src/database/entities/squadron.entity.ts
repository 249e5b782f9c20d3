import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Ship } from './ship.entity.js';

@Entity('squadrons')
export class Squadron {
  @PrimaryGeneratedColumn()
  id: number;

  /** The ship whose data this is: only its people (and fleet admins) read or change it. */
  @Column({ name: 'ship_id' })
  shipId: number;

  @ManyToOne(() => Ship, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'ship_id' })
  ship: Relation<Ship>;

  @Column({ length: 120 })
  name: string;

  @Index({ unique: true })
  @Column({ length: 12 })
  code: string;

  /** Where the cycle summary goes. */
  @Column({ length: 254 })
  email: string;
}
