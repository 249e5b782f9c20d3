import { MigrationInterface, QueryRunner } from 'typeorm';

export class DeckPositionsLandingArea1796201917830 implements MigrationInterface {
  name = 'DeckPositionsLandingArea1796201917830';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`slots\` ADD \`deck_position_kind\` varchar(8) NOT NULL DEFAULT 'spot'`);
    await queryRunner.query(`ALTER TABLE \`slots\` ADD \`deck_position_name\` varchar(20) NOT NULL DEFAULT ''`);
    // Every existing slot starts where its aircraft is parked.
    await queryRunner.query(
      `UPDATE \`slots\` s JOIN \`aircraft\` a ON a.\`id\` = s.\`aircraft_id\` SET s.\`deck_position_name\` = a.\`parked_spot\``,
    );
    await queryRunner.query(`ALTER TABLE \`cycles\` ADD \`landing_area\` varchar(10) NOT NULL DEFAULT 'clear'`);
    await queryRunner.query(`ALTER TABLE \`cycles\` ADD \`landing_area_reason\` varchar(200) NULL`);
    await queryRunner.query(`UPDATE \`cycles\` SET \`landing_area\` = 'recovering' WHERE \`landing_area_in_use\` = 1`);
    await queryRunner.query(`ALTER TABLE \`ships\` ADD \`deck_layout\` json NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`ships\` DROP COLUMN \`deck_layout\``);
    await queryRunner.query(`ALTER TABLE \`cycles\` DROP COLUMN \`landing_area_reason\``);
    await queryRunner.query(`ALTER TABLE \`cycles\` DROP COLUMN \`landing_area\``);
    await queryRunner.query(`ALTER TABLE \`slots\` DROP COLUMN \`deck_position_name\``);
    await queryRunner.query(`ALTER TABLE \`slots\` DROP COLUMN \`deck_position_kind\``);
  }
}
