import { MigrationInterface, QueryRunner } from 'typeorm';

// Squadrons, aircraft types (with their launch data), aircraft and people belong to a ship. Rows that
// exist already belong to the one ship there was (the lowest id); a person stays on it too, so an
// existing admin becomes that ship's admin rather than a fleet admin.
const OWNED = ['aircraft_types', 'squadrons', 'aircraft'] as const;
const FOREIGN_KEYS = {
  aircraft_types: 'FK_f0e250797ab0c5da6660463339c',
  squadrons: 'FK_32ffe60c466d6ad1eebfc63eb4a',
  aircraft: 'FK_99913b6cc8f6ca6aa7d566a6660',
  users: 'FK_8efd62f68c705ceb122f9324d2c',
} as const;

export class ShipsOwnTheirData1796240912480 implements MigrationInterface {
  name = 'ShipsOwnTheirData1796240912480';

  public async up(queryRunner: QueryRunner): Promise<void> {
    for (const table of [...OWNED, 'users']) {
      await queryRunner.query(`ALTER TABLE \`${table}\` ADD \`ship_id\` int NULL`);
      await queryRunner.query(`UPDATE \`${table}\` SET \`ship_id\` = (SELECT MIN(\`id\`) FROM \`ships\`)`);
    }
    for (const table of OWNED) {
      await queryRunner.query(`ALTER TABLE \`${table}\` MODIFY \`ship_id\` int NOT NULL`);
    }
    for (const [table, key] of Object.entries(FOREIGN_KEYS)) {
      await queryRunner.query(`
            ALTER TABLE \`${table}\`
            ADD CONSTRAINT \`${key}\` FOREIGN KEY (\`ship_id\`) REFERENCES \`ships\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION
        `);
    }
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    for (const [table, key] of Object.entries(FOREIGN_KEYS)) {
      await queryRunner.query(`ALTER TABLE \`${table}\` DROP FOREIGN KEY \`${key}\``);
      await queryRunner.query(`ALTER TABLE \`${table}\` DROP COLUMN \`ship_id\``);
    }
  }
}
