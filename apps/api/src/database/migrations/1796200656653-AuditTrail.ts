import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The audit trail: one append-only row per admin change, sign-in and cycle creation. */
export class AuditTrail1796200656653 implements MigrationInterface {
  name = 'AuditTrail1796200656653';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE \`audit_entries\` (
                \`id\` bigint NOT NULL AUTO_INCREMENT,
                \`at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`actor_id\` int NULL,
                \`actor_email\` varchar(254) NULL,
                \`actor_role\` varchar(20) NULL,
                \`client_address\` varchar(64) NULL,
                \`action\` varchar(40) NOT NULL,
                \`subject_type\` varchar(40) NOT NULL,
                \`subject_id\` int NULL,
                \`summary\` varchar(300) NOT NULL,
                \`before\` json NULL,
                \`after\` json NULL,
                INDEX \`ix_audit_entries_at\` (\`at\`),
                INDEX \`ix_audit_entries_action_at\` (\`action\`, \`at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE \`audit_entries\``);
  }
}
