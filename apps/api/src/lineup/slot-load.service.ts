import type { ChangeActor, LineupCommandResult, SetLoadRequest, SlotStoresLine } from '@catline/contracts';
import { STORES_MAX_LENGTH } from '@catline/contracts';
import { Injectable } from '@nestjs/common';
import { BasisChecks } from '../cycle-changes/basis-checks.service.js';
import { Clock } from '../cycle-changes/clock.js';
import { CycleChangeService } from '../cycle-changes/cycle-change.service.js';
import { grossWeightParts } from '../cycle-changes/gross-weight-parts.js';
import { LineupException } from '../cycle-changes/lineup.exception.js';
import { dropBackForReverify } from '../cycle-changes/reverify-drop-back.js';
import { updateSlot } from '../cycle-changes/slot-writes.js';
import type { AircraftType } from '../database/entities/aircraft-type.entity.js';
import type { Slot } from '../database/entities/slot.entity.js';

const lb = (value: number) => `${value.toLocaleString('en-GB')} lb`;

/** Each line names an item of the type's catalogue once; its weight each is the catalogue's of now. */
function catalogueLines(type: AircraftType, side: string, stores: SetLoadRequest['stores']): SlotStoresLine[] {
  const named = new Set<string>();
  return stores.map(({ name, count }) => {
    const key = name.toLocaleLowerCase('en');
    const item = type.storesCatalogue.find((candidate) => candidate.name.toLocaleLowerCase('en') === key);
    if (!item) {
      throw new LineupException(
        'stores_not_in_catalogue',
        `${name} is not in the stores catalogue of ${type.designation}, so ${side} cannot carry it.`,
      );
    }
    if (named.has(key)) {
      throw new LineupException('stores_not_in_catalogue', `${item.name} is listed twice; give one line its count.`);
    }
    named.add(key);
    return { name: item.name, weightEachLb: item.weightEachLb, count };
  });
}

/** The list in words for the slot's stores field, which the launch record and the exports read. */
function storesInWords(lines: SlotStoresLine[]): string {
  const words = lines.length === 0 ? 'Clean' : lines.map((line) => `${line.count} × ${line.name}`).join(', ');
  return words.length <= STORES_MAX_LENGTH ? words : `${words.slice(0, STORES_MAX_LENGTH - 1)}…`;
}

const sameLoad = (slot: Slot, fuelLb: number, operatingWeightLb: number, lines: SlotStoresLine[]) =>
  slot.loadBuild !== null &&
  slot.fuelLb === fuelLb &&
  slot.loadBuild.operatingWeightLb === operatingWeightLb &&
  JSON.stringify(slot.loadBuild.stores) === JSON.stringify(lines);

/**
 * Fuel on board and stores of a slot, set by the handler or air operations while planning and during
 * the cycle (after a hot refuel, say). The planned gross weight is built from them; once the weight was
 * agreed, the catapult work on it drops back for re-verify.
 */
@Injectable()
export class SlotLoadService {
  constructor(
    private readonly changes: CycleChangeService,
    private readonly basis: BasisChecks,
    private readonly clock: Clock,
  ) {}

  setLoad(cycleId: number, actor: ChangeActor, slotId: number, request: SetLoadRequest): Promise<LineupCommandResult> {
    return this.changes.apply(cycleId, actor, 'load_set', async (manager, state) => {
      this.basis.requireOpen(state);
      const slot = this.basis.slot(state, slotId);
      await this.basis.slotAsSeen(manager, state, slot, request.slotVersion);
      const side = slot.aircraft.sideNumber;
      if (slot.status === 'launched' || slot.status === 'scratched') {
        throw new LineupException('wrong_step', `${side} is ${slot.status}; its fuel and stores no longer change.`);
      }
      const type = slot.aircraft.type;
      if (type.operatingWeightLb === null) {
        throw new LineupException(
          'operating_weight_missing',
          `${type.designation} has no operating weight in the launch data; the admin enters it before ${side}'s weight can be built from fuel and stores.`,
        );
      }
      const lines = catalogueLines(type, side, request.stores);
      if (sameLoad(slot, request.fuelLb, type.operatingWeightLb, lines)) {
        throw new LineupException('no_change', `${side} already has this fuel and these stores.`);
      }
      const loadBuild = { operatingWeightLb: type.operatingWeightLb, stores: lines };
      const gross = grossWeightParts(request.fuelLb, loadBuild).grossWeightLb;
      const weightChanged = gross !== slot.grossWeightLb;
      await updateSlot(manager, slot, {
        fuelLb: request.fuelLb,
        stores: storesInWords(lines),
        loadBuild,
        grossWeightLb: gross,
        // The pilot answered the planned figure of before; a new one needs a new answer.
        ...(weightChanged ? { pilotWeightAckAt: null, pilotWeightAckLb: null } : {}),
      });
      const reverify = await dropBackForReverify(manager, state, 'weight', actor, this.clock.now(), [slot.id]);
      return {
        summary: `${side}: fuel ${lb(request.fuelLb)}, stores ${slot.stores}; planned weight ${lb(gross)}${reverify}`,
        command: { type: 'set_load', slotId, ...request },
        mirrored: true,
      };
    });
  }
}
