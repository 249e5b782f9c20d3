import { MigrationInterface, QueryRunner } from 'typeorm';

export class CycleDeckHolds1796216225592 implements MigrationInterface {
  name = 'CycleDeckHolds1796216225592';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`cycles\`
            ADD \`deck_holds\` json NULL AFTER \`landing_area_reason\`
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`cycles\` DROP COLUMN \`deck_holds\`
        `);
  }
}
