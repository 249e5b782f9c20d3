import { READINESS_STEPS, type LaneView, type LaunchGateView, type SlotView } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { stationState } from './station-state.js';

const up = { status: 'up' } as Pick<LaneView, 'status'>;
const down = { status: 'down' } as Pick<LaneView, 'status'>;

const gate = (code: LaunchGateView['gate'], extra: Partial<LaunchGateView> = {}): LaunchGateView => ({
  gate: code,
  soft: code === 'excess_below_recommended' || code === 'wind_reading_stale',
  waived: false,
  message: `server sentence for ${code}`,
  ...extra,
});

const slot = (status: SlotView['status'], gates: LaunchGateView[] = [], extra: Partial<SlotView> = {}) =>
  ({ id: 1, status, gates, reverifyCause: null, suspendReason: null, ...extra }) as SlotView;

const state = (lane: Pick<LaneView, 'status'>, current: SlotView | undefined) =>
  stationState(lane, current, READINESS_STEPS);

describe('the cat station banner', () => {
  it('reads CAT DOWN when the catapult is down, before anything about the aircraft', () => {
    expect(state(down, slot('suspended'))).toMatchObject({ kind: 'cat_down', title: 'CAT DOWN' });
    expect(state(down, undefined).kind).toBe('cat_down');
    expect(state(up, slot('on_catapult', [gate('catapult_down')])).kind).toBe('cat_down');
  });

  it('reads SUSPENDED with the reason once given, and asks for one before', () => {
    expect(state(up, slot('suspended', [], { suspendReason: 'Holdback' }))).toEqual({
      kind: 'suspended',
      title: 'SUSPENDED',
      detail: 'Holdback',
    });
    expect(state(up, slot('suspended')).detail).toBe('No reason given yet.');
  });

  it('reads RE-VERIFY with the cause while the figures changed under the read-back setting', () => {
    const changed = slot('tensioned', [gate('reverify_required'), gate('end_speed_over_max')], {
      reverifyCause: 'wind',
    });
    expect(state(up, changed)).toEqual({
      kind: 'reverify',
      title: 'RE-VERIFY',
      detail: 'Figures changed (wind) — re-verify the setting.',
    });
  });

  it('reads NO-GO with the first hard gate, ahead of soft gates and of steps still to take', () => {
    const refused = slot('taxiing', [
      gate('deck_not_clear'),
      gate('weight_not_agreed'),
      gate('end_speed_over_max'),
      gate('excess_below_recommended'),
    ]);
    expect(state(up, refused)).toEqual({
      kind: 'nogo',
      title: 'NO-GO',
      detail: 'The deck is not clear for this catapult.',
    });
    expect(state(up, slot('pilot_ready', [gate('end_speed_over_max')])).detail).toBe(
      'End speed over the type’s maximum.',
    );
  });

  it('reads WAIVER NEEDED, not NO-GO, when only a soft gate is closed and not waived', () => {
    expect(state(up, slot('pilot_ready', [gate('excess_below_recommended')]))).toEqual({
      kind: 'waiver',
      title: 'WAIVER NEEDED',
      detail: 'Excess wind over deck below the recommended value. Only the air boss may waive it.',
    });
  });

  it('reads WAITING FOR the next step, naming whom it waits for', () => {
    expect(state(up, slot('planned'))).toMatchObject({ kind: 'waiting', title: 'WAITING FOR' });
    expect(state(up, slot('planned')).detail).toBe('The deck crew — taxi up behind the deflector.');
    expect(state(up, slot('on_catapult', [gate('weight_not_agreed')])).detail).toBe(
      'The pilot and the catapult officer to agree the gross weight.',
    );
    expect(state(up, slot('checks_clear')).detail).toBe('The pilot to signal ready.');
    expect(state(up, undefined)).toMatchObject({ kind: 'waiting', title: 'WAITING FOR' });
  });

  it('reads GO only at the last step with every gate open or waived', () => {
    expect(state(up, slot('pilot_ready'))).toEqual({ kind: 'go', title: 'GO', detail: null });
    expect(state(up, slot('pilot_ready', [gate('wind_reading_stale', { waived: true })])).kind).toBe('go');
    expect(state(up, slot('checks_clear')).kind).toBe('waiting');
    // A step gate still closed at the last step is the server's refusal, not a GO.
    expect(state(up, slot('pilot_ready', [gate('weight_not_agreed')]))).toMatchObject({
      kind: 'nogo',
      detail: 'Gross weight not agreed.',
    });
  });
});
