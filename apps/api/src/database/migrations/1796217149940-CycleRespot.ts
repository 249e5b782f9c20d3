import { MigrationInterface, QueryRunner } from 'typeorm';

export class CycleRespot1796217149940 implements MigrationInterface {
  name = 'CycleRespot1796217149940';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`cycles\` ADD \`respot\` json NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`cycles\` DROP COLUMN \`respot\``);
  }
}
