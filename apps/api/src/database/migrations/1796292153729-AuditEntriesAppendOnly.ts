import { MigrationInterface, QueryRunner } from 'typeorm';

// The audit trail is append-only in the database itself, not only in the code: a change or removal of
// an entry, by the app or by anyone holding its database account, is refused with an error. Dropping the
// whole database (the test reset) and restoring a backup do not change or delete rows, so they still work.
// With the binary log on, a user without SUPER may create triggers only when the server has
// log_bin_trust_function_creators (scripts/mariadb/catline.cnf): these ones write nothing, so the log stays exact.
const REFUSAL = "SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'The audit trail is append-only: entries are never";

export class AuditEntriesAppendOnly1796292153729 implements MigrationInterface {
  name = 'AuditEntriesAppendOnly1796292153729';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TRIGGER \`audit_entries_no_update\` BEFORE UPDATE ON \`audit_entries\` FOR EACH ROW ${REFUSAL} changed.'`,
    );
    await queryRunner.query(
      `CREATE TRIGGER \`audit_entries_no_delete\` BEFORE DELETE ON \`audit_entries\` FOR EACH ROW ${REFUSAL} deleted.'`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER IF EXISTS \`audit_entries_no_delete\``);
    await queryRunner.query(`DROP TRIGGER IF EXISTS \`audit_entries_no_update\``);
  }
}
