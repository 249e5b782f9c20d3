import type {
  ArmState,
  DeckPositionKind,
  LaunchRecord,
  ReverifyCause,
  SettingReadBackView,
  SlotStatus,
  SlotStoresLine,
  SoftLaunchGateCode,
} from '@catline/contracts';
import type { LastStep } from '@catline/launch-math';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique, type Relation } from 'typeorm';
import { Aircraft } from './aircraft.entity.js';
import { Cycle } from './cycle.entity.js';
import { InstantColumn } from '../columns.js';
import { Catapult } from './catapult.entity.js';
import { User } from './user.entity.js';

/** A soft launch gate the air boss waived for this aircraft, with who and when. */
export interface StoredWaiver {
  gate: SoftLaunchGateCode;
  reason: string;
  byId: number;
  byName: string;
  /** ISO instant. */
  at: string;
}

/** What a slot's planned gross weight was built from besides its fuel: kept, so the parts always add up to it. */
export interface StoredLoadBuild {
  operatingWeightLb: number;
  stores: SlotStoresLine[];
}

/** One aircraft's place in a cycle: in the deck pool (no catapult) or in a catapult's lane. */
@Entity('slots')
@Unique('uq_slots_cycle_aircraft', ['cycleId', 'aircraftId'])
@Unique('uq_slots_launch_key', ['launchIdempotencyKey'])
@Index('ix_slots_lane', ['cycleId', 'catapultId', 'position'])
export class Slot {
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ name: 'cycle_id' })
  cycleId: number;

  @ManyToOne(() => Cycle, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'cycle_id' })
  cycle: Relation<Cycle>;

  @Column({ name: 'aircraft_id' })
  aircraftId: number;

  @ManyToOne(() => Aircraft, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'aircraft_id' })
  aircraft: Relation<Aircraft>;

  @Column({ name: 'pilot_id', type: 'int', nullable: true })
  pilotId: number | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'pilot_id' })
  pilot: Relation<User> | null;

  @Column({ length: 60 })
  mission: string;

  @Column({ name: 'fuel_lb' })
  fuelLb: number;

  @Column({ length: 120, default: '' })
  stores: string;

  @Column({ name: 'gross_weight_lb' })
  grossWeightLb: number;

  /** Set with fuel and stores; null while the gross weight is the one typed in the air plan. */
  @Column({ name: 'load_build', type: 'json', nullable: true })
  loadBuild: StoredLoadBuild | null;

  /** Null until the deck crew first records it. */
  @Column({ name: 'arm_state', type: 'varchar', length: 5, nullable: true })
  armState: ArmState | null;

  @InstantColumn({ name: 'arm_state_at', nullable: true })
  armStateAt: Date | null;

  /** The name of who recorded it, as it was then (the change log keeps the person). */
  @Column({ name: 'arm_state_by', type: 'varchar', length: 120, nullable: true })
  armStateBy: string | null;

  @Column({ default: false })
  tanker: boolean;

  @Column({ name: 'early_warning', default: false })
  earlyWarning: boolean;

  @Column({ default: false })
  spare: boolean;

  /** Null while in the deck pool. */
  @Column({ name: 'catapult_id', type: 'int', nullable: true })
  catapultId: number | null;

  @ManyToOne(() => Catapult, { nullable: true, onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'catapult_id' })
  catapult: Relation<Catapult> | null;

  /** 0-based place in the lane; null in the deck pool. */
  @Column({ type: 'int', nullable: true })
  position: number | null;

  /** Where the aircraft is in this cycle: a deck spot, an elevator or a hangar bay. */
  @Column({ name: 'deck_position_kind', type: 'varchar', length: 8, default: 'spot' })
  deckPositionKind: DeckPositionKind;

  /** The spot's, elevator's or bay's name; empty until the slot's starting position is set. */
  @Column({ name: 'deck_position_name', length: 20, default: '' })
  deckPositionName: string;

  @Column({ type: 'varchar', length: 14, default: 'planned' })
  status: SlotStatus;

  /** Bumped by every change to this slot; the basis that commands on it must name. */
  @Column({ default: 0 })
  version: number;

  @Column({ name: 'pilot_weight_ack_lb', type: 'int', nullable: true })
  pilotWeightAckLb: number | null;

  @InstantColumn({ name: 'pilot_weight_ack_at', nullable: true })
  pilotWeightAckAt: Date | null;

  /** The gross weight the crew recorded as agreed with the pilot (lb); the setting is worked out from it. */
  @Column({ name: 'agreed_weight_lb', type: 'int', nullable: true })
  agreedWeightLb: number | null;

  @InstantColumn({ name: 'catapult_weight_ack_at', nullable: true })
  catapultWeightAckAt: Date | null;

  @InstantColumn({ name: 'taxiing_at', nullable: true })
  taxiingAt: Date | null;

  @InstantColumn({ name: 'on_catapult_at', nullable: true })
  onCatapultAt: Date | null;

  @InstantColumn({ name: 'tensioned_at', nullable: true })
  tensionedAt: Date | null;

  @InstantColumn({ name: 'suspended_at', nullable: true })
  suspendedAt: Date | null;

  @Column({ name: 'suspend_reason', type: 'varchar', length: 200, nullable: true })
  suspendReason: string | null;

  @InstantColumn({ name: 'down_at', nullable: true })
  downAt: Date | null;

  /** The catapult whose order a down aircraft left; null while it is not down, or went down from the deck pool. */
  @Column({ name: 'down_catapult_id', type: 'int', nullable: true })
  downCatapultId: number | null;

  /** The spare slot that took this down aircraft's place. */
  @Column({ name: 'replaced_by_slot_id', type: 'int', nullable: true })
  replacedBySlotId: number | null;

  /** Who recorded the agreed weight, and so gave the setting to set; null while none is agreed. */
  @Column({ name: 'weight_agreed_by', type: 'varchar', length: 120, nullable: true })
  weightAgreedBy: string | null;

  /** The two-person check of the setting; null until read back, and again once the aircraft drops back before it. */
  @Column({ name: 'setting_read_back', type: 'json', nullable: true })
  settingReadBack: SettingReadBackView | null;

  /** What changed under the agreed figures since they were verified; cleared when the setting is read back again. */
  @Column({ name: 'reverify_cause', type: 'varchar', length: 12, nullable: true })
  reverifyCause: ReverifyCause | null;

  /** The last readiness step taken, which its taker may undo for a short while; null when none is. */
  @Column({ name: 'last_step', type: 'json', nullable: true })
  lastStep: LastStep | null;

  /** Waivers of soft launch gates; null for none. Cleared when the figures change under them. */
  @Column({ type: 'json', nullable: true })
  waivers: StoredWaiver[] | null;

  @InstantColumn({ name: 'launched_at', nullable: true })
  launchedAt: Date | null;

  /** The client's key of the launch that was recorded; a repeat with it is answered, not applied. */
  @Column({ name: 'launch_idempotency_key', type: 'varchar', length: 64, nullable: true })
  launchIdempotencyKey: string | null;

  /** What was used with the shot, frozen by the launch command; never computed again. */
  @Column({ name: 'launch_record', type: 'json', nullable: true })
  launchRecord: LaunchRecord | null;

  /** Set at the shot when it went under waivers: which gates, and why (the full waivers stay in `waivers`). */
  @Column({ name: 'override_reason', type: 'varchar', length: 200, nullable: true })
  overrideReason: string | null;

  @InstantColumn({ name: 'status_at', nullable: true })
  statusAt: Date | null;

  @Column({ name: 'status_by_id', type: 'int', nullable: true })
  statusById: number | null;

  @ManyToOne(() => User, { nullable: true, onDelete: 'SET NULL' })
  @JoinColumn({ name: 'status_by_id' })
  statusBy: Relation<User> | null;
}
