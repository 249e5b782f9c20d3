import { MigrationInterface, QueryRunner } from 'typeorm';

export class SlotLoadBuild1796227583908 implements MigrationInterface {
  name = 'SlotLoadBuild1796227583908';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`slots\` ADD \`load_build\` json NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`slots\` DROP COLUMN \`load_build\``);
  }
}
