import { MigrationInterface, QueryRunner } from 'typeorm';

export class SettingReadBackAndHoldback1796302400000 implements MigrationInterface {
  name = 'SettingReadBackAndHoldback1796302400000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`slots\` ADD \`weight_agreed_by\` varchar(120) NULL`);
    await queryRunner.query(`ALTER TABLE \`slots\` ADD \`setting_read_back\` json NULL`);
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` ADD \`holdback_element\` varchar(20) NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`aircraft_types\` DROP COLUMN \`holdback_element\``);
    await queryRunner.query(`ALTER TABLE \`slots\` DROP COLUMN \`setting_read_back\``);
    await queryRunner.query(`ALTER TABLE \`slots\` DROP COLUMN \`weight_agreed_by\``);
  }
}
