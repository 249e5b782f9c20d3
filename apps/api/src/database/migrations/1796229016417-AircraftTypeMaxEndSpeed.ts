import { MigrationInterface, QueryRunner } from 'typeorm';

export class AircraftTypeMaxEndSpeed1796229016417 implements MigrationInterface {
  name = 'AircraftTypeMaxEndSpeed1796229016417';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // Nullable: no figure can be made up for an existing type; the launch gate refuses its shots until entered.
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` ADD \`max_end_speed_kt\` double NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` DROP COLUMN \`max_end_speed_kt\``);
  }
}
