import { MigrationInterface, QueryRunner } from 'typeorm';

export class SlotAgreedWeightAndLastStep1796203000000 implements MigrationInterface {
  name = 'SlotAgreedWeightAndLastStep1796203000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD \`agreed_weight_lb\` int NULL AFTER \`pilot_weight_ack_at\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD \`last_step\` json NULL AFTER \`reverify_cause\`
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP COLUMN \`last_step\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP COLUMN \`agreed_weight_lb\`
        `);
  }
}
