import { MigrationInterface, QueryRunner } from 'typeorm';

// Each audit entry names the ship of its subject, so a ship's admin reads only their own ship's trail.
// Entries written so far are of the one ship there was (the lowest id), as ShipsOwnTheirData decided.
export class AuditEntryShip1796245854530 implements MigrationInterface {
  name = 'AuditEntryShip1796245854530';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`audit_entries\` ADD \`ship_id\` int NULL`);
    await queryRunner.query(`UPDATE \`audit_entries\` SET \`ship_id\` = (SELECT MIN(\`id\`) FROM \`ships\`)`);
    await queryRunner.query(`CREATE INDEX \`ix_audit_entries_ship_at\` ON \`audit_entries\` (\`ship_id\`, \`at\`)`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`ix_audit_entries_ship_at\` ON \`audit_entries\``);
    await queryRunner.query(`ALTER TABLE \`audit_entries\` DROP COLUMN \`ship_id\``);
  }
}
