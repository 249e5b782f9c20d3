import { MigrationInterface, QueryRunner } from 'typeorm';

export class SlotDownCatapult1796228372875 implements MigrationInterface {
  name = 'SlotDownCatapult1796228372875';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD \`down_catapult_id\` int NULL AFTER \`down_at\`
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP COLUMN \`down_catapult_id\`
        `);
  }
}
