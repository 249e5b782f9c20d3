import { MigrationInterface, QueryRunner } from 'typeorm';

export class SlotArmState1796243880772 implements MigrationInterface {
  name = 'SlotArmState1796243880772';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // Null for every slot so far: nobody recorded armed or safe, and neither may be assumed.
    await queryRunner.query(
      `ALTER TABLE \`slots\` ADD \`arm_state\` varchar(5) NULL, ADD \`arm_state_at\` datetime(3) NULL, ADD \`arm_state_by\` varchar(120) NULL`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`slots\` DROP COLUMN \`arm_state\`, DROP COLUMN \`arm_state_at\`, DROP COLUMN \`arm_state_by\``,
    );
  }
}
