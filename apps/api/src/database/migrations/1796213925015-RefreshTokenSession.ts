import { MigrationInterface, QueryRunner } from 'typeorm';

/** Each refresh token names its session (kept across rotations); the tokens already out each start one. */
export class RefreshTokenSession1796213925015 implements MigrationInterface {
  name = 'RefreshTokenSession1796213925015';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`refresh_tokens\`
            ADD \`session_id\` char(36) NOT NULL AFTER \`user_id\`
        `);
    await queryRunner.query(`
            UPDATE \`refresh_tokens\` SET \`session_id\` = UUID()
        `);
    await queryRunner.query(`
            CREATE INDEX \`ix_refresh_tokens_session\` ON \`refresh_tokens\` (\`session_id\`)
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            DROP INDEX \`ix_refresh_tokens_session\` ON \`refresh_tokens\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`refresh_tokens\` DROP COLUMN \`session_id\`
        `);
  }
}
