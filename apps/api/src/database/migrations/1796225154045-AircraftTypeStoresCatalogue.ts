import { MigrationInterface, QueryRunner } from 'typeorm';

export class AircraftTypeStoresCatalogue1796225154045 implements MigrationInterface {
  name = 'AircraftTypeStoresCatalogue1796225154045';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` ADD \`operating_weight_lb\` int NULL`);
    // Existing types start with an empty catalogue; the column takes no default, so add it nullable first.
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` ADD \`stores_catalogue\` json NULL`);
    await queryRunner.query(`UPDATE \`aircraft_types\` SET \`stores_catalogue\` = '[]'`);
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` MODIFY \`stores_catalogue\` json NOT NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` DROP COLUMN \`stores_catalogue\``);
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` DROP COLUMN \`operating_weight_lb\``);
  }
}
