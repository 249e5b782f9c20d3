import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

@Entity('squadrons')
export class Squadron {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ length: 120 })
  name: string;

  @Index({ unique: true })
  @Column({ length: 12 })
  code: string;

  /** Where the cycle summary goes. */
  @Column({ length: 254 })
  email: string;
}
