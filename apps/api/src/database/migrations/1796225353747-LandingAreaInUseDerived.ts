import { MigrationInterface, QueryRunner } from 'typeorm';

// Whether the landing area is in use follows from its state (recovering or fouled), so the flag that
// repeated it goes; nothing outside Catline read it.
export class LandingAreaInUseDerived1796225353747 implements MigrationInterface {
  name = 'LandingAreaInUseDerived1796225353747';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`cycles\` DROP COLUMN \`landing_area_in_use\``);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`cycles\` ADD \`landing_area_in_use\` tinyint NOT NULL DEFAULT 0`);
    await queryRunner.query(`UPDATE \`cycles\` SET \`landing_area_in_use\` = \`landing_area\` <> 'clear'`);
  }
}
