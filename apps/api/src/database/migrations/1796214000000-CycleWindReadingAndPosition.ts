import { MigrationInterface, QueryRunner } from 'typeorm';

export class CycleWindReadingAndPosition1796214000000 implements MigrationInterface {
  name = 'CycleWindReadingAndPosition1796214000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`cycles\`
            ADD \`wind_gust_from_deg\` double NULL AFTER \`true_wind_speed_kt\`,
            ADD \`wind_gust_kt\` double NULL AFTER \`wind_gust_from_deg\`,
            ADD \`wind_lull_from_deg\` double NULL AFTER \`wind_gust_kt\`,
            ADD \`wind_lull_kt\` double NULL AFTER \`wind_lull_from_deg\`,
            ADD \`wind_read_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) AFTER \`wind_lull_kt\`,
            ADD \`latitude_deg\` double NULL AFTER \`wind_read_at\`,
            ADD \`longitude_deg\` double NULL AFTER \`latitude_deg\`
        `);
    // A cycle entered before readings had a spread read its steady wind, last at its last change.
    await queryRunner.query(`
            UPDATE \`cycles\`
            SET \`wind_gust_from_deg\` = \`true_wind_from_deg\`, \`wind_gust_kt\` = \`true_wind_speed_kt\`,
                \`wind_lull_from_deg\` = \`true_wind_from_deg\`, \`wind_lull_kt\` = \`true_wind_speed_kt\`,
                \`wind_read_at\` = \`updated_at\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`cycles\`
            MODIFY \`wind_gust_from_deg\` double NOT NULL,
            MODIFY \`wind_gust_kt\` double NOT NULL,
            MODIFY \`wind_lull_from_deg\` double NOT NULL,
            MODIFY \`wind_lull_kt\` double NOT NULL
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`cycles\`
            DROP COLUMN \`longitude_deg\`,
            DROP COLUMN \`latitude_deg\`,
            DROP COLUMN \`wind_read_at\`,
            DROP COLUMN \`wind_lull_kt\`,
            DROP COLUMN \`wind_lull_from_deg\`,
            DROP COLUMN \`wind_gust_kt\`,
            DROP COLUMN \`wind_gust_from_deg\`
        `);
  }
}
