import { MigrationInterface, QueryRunner } from 'typeorm';

export class CyclePrerequisiteTicks1796290000000 implements MigrationInterface {
  name = 'CyclePrerequisiteTicks1796290000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`cycles\`
            ADD \`prerequisite_ticks\` json NULL AFTER \`deck_holds\`
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`cycles\` DROP COLUMN \`prerequisite_ticks\`
        `);
  }
}
