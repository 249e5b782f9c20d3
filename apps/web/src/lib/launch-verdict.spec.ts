import type { LaunchGateView, SlotView } from '@catline/contracts';
import { describe, expect, it } from 'vitest';
import { slotGoVerdict } from './launch-verdict.js';

const gate = (code: LaunchGateView['gate'], soft = false, waived = false): LaunchGateView => ({
  gate: code,
  soft,
  waived,
  message: code,
});

const card = (status: SlotView['status'], gates: LaunchGateView[] | null, go = true) =>
  ({ status, gates, figures: { go } }) as Pick<SlotView, 'status' | 'gates' | 'figures'>;

describe("a lineup card's go/no-go", () => {
  it('holds a slot closed only by a soft gate for a waiver, not as a refusal', () => {
    expect(slotGoVerdict(card('planned', [gate('excess_below_recommended', true)], false))).toBe('waiver');
    expect(slotGoVerdict(card('planned', [gate('excess_below_recommended', true, true)], false))).toBe('go');
  });

  it('refuses on a hard limit the figures alone do not show', () => {
    expect(slotGoVerdict(card('taxiing', [gate('end_speed_over_max')], true))).toBe('nogo');
  });

  it('does not refuse for steps still to take or a cycle not yet started', () => {
    const steps = [gate('cycle_not_executing'), gate('weight_not_agreed'), gate('reverify_required')];
    expect(slotGoVerdict(card('planned', steps))).toBe('go');
  });

  it('judges a launched aircraft, or one in the deck pool, by its figures', () => {
    expect(slotGoVerdict(card('launched', [gate('deck_not_clear')], true))).toBe('go');
    expect(slotGoVerdict(card('planned', null, false))).toBe('nogo');
  });
});
