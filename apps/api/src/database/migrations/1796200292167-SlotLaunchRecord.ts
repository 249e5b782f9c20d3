import type { LineupPatch, Role } from '@catline/contracts';
import { MigrationInterface, QueryRunner } from 'typeorm';
import { rebuildLaunchRecord } from '../launch-record-rebuild.js';

interface SlotRow {
  id: number;
  cycle_id: number;
  catapult_id: number;
  catapult_number: number;
  launched_at: Date;
  gross_weight_lb: number;
  fuel_lb: number;
  stores: string;
  override_reason: string | null;
  status_by_id: number | null;
  status_by_name: string | null;
}

interface ChangeRow {
  actor_id: number;
  actor_name: string;
  actor_role: Role;
  payload: string | { patch: LineupPatch };
}

/**
 * Gives every launched slot without a launch record one rebuilt from the change that launched it (see
 * rebuildLaunchRecord). Exported so a test can run it on slots launched by the API.
 */
export async function rebuildMissingLaunchRecords(queryRunner: QueryRunner): Promise<void> {
  const slots: SlotRow[] = await queryRunner.query(`
            SELECT s.id, s.cycle_id, s.catapult_id, c.number AS catapult_number, s.launched_at, s.gross_weight_lb,
                   s.fuel_lb, s.stores, s.override_reason, s.status_by_id, u.name AS status_by_name
            FROM \`slots\` s
            JOIN \`catapults\` c ON c.id = s.catapult_id
            LEFT JOIN \`users\` u ON u.id = s.status_by_id
            WHERE s.status = 'launched' AND s.launched_at IS NOT NULL AND s.launch_record IS NULL
        `);
  for (const slot of slots) {
    const [change]: ChangeRow[] = await queryRunner.query(
      `SELECT actor_id, actor_name, actor_role, payload FROM \`cycle_changes\`
         WHERE cycle_id = ? AND kind = 'slot_launched' AND JSON_VALUE(payload, '$.command.slotId') = ?
         ORDER BY version LIMIT 1`,
      [slot.cycle_id, slot.id],
    );
    const payload = change && (typeof change.payload === 'string' ? JSON.parse(change.payload) : change.payload);
    const record = rebuildLaunchRecord(
      {
        id: slot.id,
        catapultId: slot.catapult_id,
        catapultNumber: slot.catapult_number,
        launchedAt: new Date(slot.launched_at),
        grossWeightLb: slot.gross_weight_lb,
        fuelLb: slot.fuel_lb,
        stores: slot.stores,
        overrideReason: slot.override_reason,
        statusById: slot.status_by_id,
        statusByName: slot.status_by_name,
      },
      change
        ? {
            actorId: change.actor_id,
            actorName: change.actor_name,
            actorRole: change.actor_role,
            patch: payload.patch,
          }
        : null,
    );
    await queryRunner.query('UPDATE `slots` SET `launch_record` = ? WHERE id = ?', [JSON.stringify(record), slot.id]);
  }
}

/** Each slot keeps what was used with its shot; slots launched before this get a record rebuilt from the change log. */
export class SlotLaunchRecord1796200292167 implements MigrationInterface {
  name = 'SlotLaunchRecord1796200292167';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`slots\`
            ADD \`launch_record\` json NULL
        `);
    await rebuildMissingLaunchRecords(queryRunner);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`slots\` DROP COLUMN \`launch_record\`
        `);
  }
}
