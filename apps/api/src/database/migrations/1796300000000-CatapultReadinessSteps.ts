import { MigrationInterface, QueryRunner } from 'typeorm';

export class CatapultReadinessSteps1796300000000 implements MigrationInterface {
  name = 'CatapultReadinessSteps1796300000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // Null for every existing catapult: each keeps running the ship's list until the admin gives it its own.
    await queryRunner.query(`
            ALTER TABLE \`catapults\`
            ADD \`readiness_steps\` json NULL AFTER \`shot_count\`
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`catapults\` DROP COLUMN \`readiness_steps\`
        `);
  }
}
