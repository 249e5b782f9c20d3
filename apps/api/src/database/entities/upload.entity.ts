import type { ImportProblem, UploadResult } from '@catline/contracts';
import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { AircraftType } from './aircraft-type.entity.js';
import { Cycle } from './cycle.entity.js';
import { InstantColumn } from '../columns.js';
import { User } from './user.entity.js';

export const UPLOAD_KINDS = ['air_plan', 'launch_table'] as const;
export type UploadKind = (typeof UPLOAD_KINDS)[number];

/**
 * Every file uploaded for import, kept whether it was accepted or not: who sent what, its checksum,
 * what the preview found, and the rows read from it, which its confirm imports as they were previewed.
 */
@Entity('uploads')
export class Upload {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: 'varchar', length: 20 })
  kind: UploadKind;

  /** The cycle an air plan is for. */
  @Column({ name: 'cycle_id', type: 'int', nullable: true })
  cycleId: number | null;

  @ManyToOne(() => Cycle, { nullable: true, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'cycle_id' })
  cycle: Relation<Cycle> | null;

  /** The aircraft type a launch table is for. */
  @Column({ name: 'aircraft_type_id', type: 'int', nullable: true })
  aircraftTypeId: number | null;

  @ManyToOne(() => AircraftType, { nullable: true, onDelete: 'CASCADE' })
  @JoinColumn({ name: 'aircraft_type_id' })
  aircraftType: Relation<AircraftType> | null;

  @Column({ name: 'uploaded_by_id' })
  uploadedById: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'uploaded_by_id' })
  uploadedBy: Relation<User>;

  @InstantColumn({ name: 'uploaded_at' })
  uploadedAt: Date;

  /** As the sender's computer named it. */
  @Column({ name: 'file_name', length: 255 })
  fileName: string;

  @Column({ name: 'mime_type', length: 100 })
  mimeType: string;

  @Column({ name: 'size_bytes' })
  sizeBytes: number;

  @Column({ type: 'char', length: 64 })
  sha256: string;

  @Column({ type: 'varchar', length: 10 })
  result: UploadResult;

  @Column({ name: 'problem_count' })
  problemCount: number;

  /** The first MAX_IMPORT_PROBLEMS of them, cells cut short; problemCount counts them all. */
  @Column({ type: 'json' })
  problems: ImportProblem[];

  /** The rows read, for the confirm; null when the upload was rejected (nothing of it is ever imported). */
  @Column({ name: 'parsed_rows', type: 'json', nullable: true })
  rows: object[] | null;

  @InstantColumn({ name: 'imported_at', nullable: true })
  importedAt: Date | null;

  @Column({ name: 'imported_by_id', type: 'int', nullable: true })
  importedById: number | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'imported_by_id' })
  importedBy: Relation<User> | null;
}
