import { MigrationInterface, QueryRunner } from 'typeorm';

export class SlotReverifyAndWaivers1796200677124 implements MigrationInterface {
  name = 'SlotReverifyAndWaivers1796200677124';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD \`reverify_cause\` varchar(12) NULL AFTER \`replaced_by_slot_id\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD \`waivers\` json NULL AFTER \`reverify_cause\`
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP COLUMN \`waivers\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP COLUMN \`reverify_cause\`
        `);
  }
}
