import { MigrationInterface, QueryRunner } from 'typeorm';

export class AircraftTypeSettingTables1796262840562 implements MigrationInterface {
  name = 'AircraftTypeSettingTables1796262840562';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // No approved setting can be made up for an existing type: its shots are refused until the admin enters the tables.
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` ADD \`setting_tables\` json NULL`);
    await queryRunner.query(`UPDATE \`aircraft_types\` SET \`setting_tables\` = '[]'`);
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` MODIFY \`setting_tables\` json NOT NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` DROP COLUMN \`setting_tables\``);
  }
}
