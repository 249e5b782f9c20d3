import { Injectable } from '@nestjs/common';
import { type EntityManager, In } from 'typeorm';
import type { Cycle } from '../cycles/entities/cycle.entity.js';
import { CycleChange } from '../cycle-changes/entities/cycle-change.entity.js';
import { Slot } from '../cycle-changes/entities/slot.entity.js';
import { Catapult } from '../ships/entities/catapult.entity.js';
import { Ship } from '../ships/entities/ship.entity.js';
import type { Squadron } from '../squadrons/entities/squadron.entity.js';
import { type CycleSummaryInput, composeCycleSummary, type SummaryEvent } from './cycle-summary.js';
import type { MailKind } from './entities/outbox-mail.entity.js';

export interface MailDraft {
  kind: MailKind;
  to: string;
  subject: string;
  text: string;
  /** What the mail is about; queuing the same key again changes nothing. */
  dedupeKey: string;
}

/** Changes whose account a squadron wants besides its aircraft's outcome. */
const TOLD_KINDS = ['aircraft_down', 'slot_suspended', 'slot_launched'] as const;

/**
 * Queues mail in the caller's transaction: the mail exists exactly when the change that caused it
 * committed. The sender (MailSender) delivers it later.
 */
@Injectable()
export class MailOutbox {
  async enqueue(manager: EntityManager, draft: MailDraft): Promise<void> {
    // The instant comes from this process, like the sender's "due" check, whatever the server's time zone.
    await manager.query(
      `INSERT INTO mail_outbox (kind, to_address, subject, body_text, dedupe_key, next_attempt_at)
       VALUES (?, ?, ?, ?, ?, ?)
       ON DUPLICATE KEY UPDATE dedupe_key = dedupe_key`,
      [draft.kind, draft.to, draft.subject.slice(0, 200), draft.text, draft.dedupeKey, new Date()],
    );
  }

  /** One summary per squadron with aircraft in the cycle, to the squadron's address; call inside the closing transaction. */
  async enqueueCycleSummary(manager: EntityManager, cycle: Cycle): Promise<void> {
    const slots = await manager.find(Slot, {
      where: { cycleId: cycle.id },
      relations: { aircraft: { type: true, squadron: true }, pilot: true },
      order: { id: 'ASC' },
    });
    if (slots.length === 0) return;
    const [ship, catapults, changes] = await Promise.all([
      manager.findOneByOrFail(Ship, { id: cycle.shipId }),
      manager.findBy(Catapult, { shipId: cycle.shipId }),
      manager.find(CycleChange, { where: { cycleId: cycle.id, kind: In([...TOLD_KINDS]) }, order: { version: 'ASC' } }),
    ]);
    const input = summaryInput(cycle, ship, catapults, slots, changes);
    const squadrons = new Map<number, Squadron>(slots.map((slot) => [slot.aircraft.squadronId, slot.aircraft.squadron]));
    for (const squadron of squadrons.values()) {
      const mail = composeCycleSummary(input, squadron);
      await this.enqueue(manager, { kind: 'cycle_summary', to: squadron.email, ...mail, dedupeKey: `cycle-summary:${cycle.id}:${squadron.id}` });
    }
  }
}

function summaryInput(cycle: Cycle, ship: Ship, catapults: Catapult[], slots: Slot[], changes: CycleChange[]): CycleSummaryInput {
  const catapultNumber = new Map(catapults.map((catapult) => [catapult.id, catapult.number]));
  const sideOf = new Map(slots.map((slot) => [slot.id, slot.aircraft.sideNumber]));
  return {
    shipName: ship.name,
    hullCode: ship.hullCode,
    cycleNumber: cycle.number,
    plannedLaunchAt: cycle.plannedLaunchAt,
    windowStartAt: cycle.windowStartAt,
    windowEndAt: cycle.windowEndAt,
    weatherCase: cycle.weatherCase,
    night: cycle.night,
    slots: slots.map((slot) => ({
      id: slot.id,
      sideNumber: slot.aircraft.sideNumber,
      typeDesignation: slot.aircraft.type.designation,
      squadronId: slot.aircraft.squadronId,
      mission: slot.mission,
      pilotName: slot.pilot?.name ?? null,
      status: slot.status,
      catapultNumber: slot.status === 'launched' && slot.catapultId !== null ? (catapultNumber.get(slot.catapultId) ?? null) : null,
      launchedAt: slot.launchedAt,
      replacedBy: slot.replacedBySlotId === null ? null : (sideOf.get(slot.replacedBySlotId) ?? null),
    })),
    events: changes.flatMap((change): SummaryEvent[] => {
      const { slotId, overrideReason } = change.payload.command as { slotId?: unknown; overrideReason?: unknown };
      // A launch is told only when it went on override; the slot's line already gives its time.
      if (typeof slotId !== 'number' || (change.kind === 'slot_launched' && !overrideReason)) return [];
      return [{ at: change.at, slotId, summary: change.summary }];
    }),
  };
}
