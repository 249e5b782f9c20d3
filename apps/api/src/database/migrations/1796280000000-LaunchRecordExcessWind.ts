import { MigrationInterface, QueryRunner } from 'typeorm';

export class LaunchRecordExcessWind1796280000000 implements MigrationInterface {
  name = 'LaunchRecordExcessWind1796280000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    // Records kept so far froze the margin only: the excess wind over deck and the recommended excess
    // they showed were not kept, and are not worked out again now.
    await queryRunner.query(
      `UPDATE \`slots\` SET \`launch_record\` = JSON_INSERT(\`launch_record\`, '$.excessWindOverDeckKt', NULL, '$.recommendedExcessKt', NULL) WHERE \`launch_record\` IS NOT NULL`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `UPDATE \`slots\` SET \`launch_record\` = JSON_REMOVE(\`launch_record\`, '$.excessWindOverDeckKt', '$.recommendedExcessKt') WHERE \`launch_record\` IS NOT NULL`,
    );
  }
}
