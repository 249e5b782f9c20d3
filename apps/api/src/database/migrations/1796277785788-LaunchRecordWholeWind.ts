import type { LaunchRecord } from '@catline/contracts';
import { MigrationInterface, QueryRunner } from 'typeorm';
import { windReadingUsed } from '../../cycle-changes/launch-record.js';

/** The wind fields of a record frozen before the record kept the whole reading. */
type OldWindReading = Omit<
  NonNullable<LaunchRecord['windReading']>,
  'windGustFromDeg' | 'windGustKt' | 'windLullFromDeg' | 'windLullKt' | 'relativeWindBearingDeg' | 'relativeWindSpeedKt'
>;

const ADDED_PATHS = [
  '$.windReading.windGustFromDeg',
  '$.windReading.windGustKt',
  '$.windReading.windLullFromDeg',
  '$.windReading.windLullKt',
  '$.windReading.relativeWindBearingDeg',
  '$.windReading.relativeWindSpeedKt',
];

/**
 * The launch record freezes the whole wind reading: its gust and lull and the wind across the deck. A record
 * frozen before gets the wind across the deck worked out from the ship's course and speed it kept; its
 * spread was not kept and stays null rather than guessed.
 */
export class LaunchRecordWholeWind1796277785788 implements MigrationInterface {
  name = 'LaunchRecordWholeWind1796277785788';

  public async up(queryRunner: QueryRunner): Promise<void> {
    const rows: { id: number; launch_record: string | LaunchRecord }[] = await queryRunner.query(
      `SELECT id, launch_record FROM \`slots\`
         WHERE JSON_TYPE(JSON_EXTRACT(launch_record, '$.windReading')) = 'OBJECT'
           AND JSON_EXTRACT(launch_record, '$.windReading.relativeWindSpeedKt') IS NULL`,
    );
    for (const row of rows) {
      const record = typeof row.launch_record === 'string' ? JSON.parse(row.launch_record) : row.launch_record;
      const old: OldWindReading = record.windReading;
      const windReading = windReadingUsed({
        ...old,
        windGustFromDeg: null,
        windGustKt: null,
        windLullFromDeg: null,
        windLullKt: null,
        windReadAt: old.readAt,
      });
      await queryRunner.query('UPDATE `slots` SET `launch_record` = ? WHERE id = ?', [
        JSON.stringify({ ...record, windReading }),
        row.id,
      ]);
    }
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    const paths = ADDED_PATHS.map(() => '?').join(', ');
    await queryRunner.query(
      `UPDATE \`slots\` SET \`launch_record\` = JSON_REMOVE(\`launch_record\`, ${paths})
         WHERE JSON_TYPE(JSON_EXTRACT(launch_record, '$.windReading')) = 'OBJECT'`,
      ADDED_PATHS,
    );
  }
}
