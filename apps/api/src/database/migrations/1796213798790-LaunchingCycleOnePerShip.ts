import { MigrationInterface, QueryRunner } from 'typeorm';

// One launching cycle per ship, held by the database: a stored column is the ship's id while the cycle
// executes (null otherwise) under a unique index. The metadata row is how TypeORM's schema diff knows
// the column's expression.
const EXPRESSION = "case when `state` = 'executing' then `ship_id` end";

export class LaunchingCycleOnePerShip1796213798790 implements MigrationInterface {
  name = 'LaunchingCycleOnePerShip1796213798790';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`cycles\`
            ADD \`launching_ship_id\` int AS (${EXPRESSION}) STORED AFTER \`state\`
        `);
    await queryRunner.query(`
            CREATE UNIQUE INDEX \`uq_cycles_launching_ship\` ON \`cycles\` (\`launching_ship_id\`)
        `);
    await queryRunner.query(
      `
            INSERT INTO \`typeorm_metadata\` (\`database\`, \`schema\`, \`table\`, \`type\`, \`name\`, \`value\`)
            VALUES (DEFAULT, DATABASE(), 'cycles', 'GENERATED_COLUMN', 'launching_ship_id', ?)
        `,
      [EXPRESSION],
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            DELETE FROM \`typeorm_metadata\`
            WHERE \`type\` = 'GENERATED_COLUMN' AND \`table\` = 'cycles' AND \`name\` = 'launching_ship_id'
        `);
    await queryRunner.query(`
            DROP INDEX \`uq_cycles_launching_ship\` ON \`cycles\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`cycles\` DROP COLUMN \`launching_ship_id\`
        `);
  }
}
