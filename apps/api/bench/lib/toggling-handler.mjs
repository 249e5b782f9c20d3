// A handler that moves one slot back and forth between the deck pool and a lane, keeping the basis
// of every command from the answers it gets (and reloading the lineup after a refusal).
import { applyLineupPatch } from '@catline/contracts';
import { apiClient, expectOk } from './http.mjs';

export class TogglingHandler {
  constructor(baseUrl, token, cycleId) {
    this.api = apiClient(baseUrl, token);
    this.cycleId = cycleId;
  }

  async load() {
    this.snapshot = expectOk(await this.api.get(`/cycles/${this.cycleId}/lineup`), 'load lineup');
    return this.snapshot;
  }

  /** Sends one move of `slotId` (into the lane of `catapultId` when it is pooled, else back to the pool). */
  async toggle(slotId, catapultId) {
    const slot = this.snapshot.slots.find((s) => s.id === slotId);
    const toCatapultId = slot.catapultId === null ? catapultId : null;
    const lane = this.snapshot.lanes.find((l) => l.catapultId === toCatapultId);
    const response = await this.api.post(`/cycles/${this.cycleId}/lineup/moves`, {
      slotId,
      slotVersion: slot.version,
      toCatapultId,
      toIndex: 0,
      targetLaneOrder: lane ? lane.slotIds : [],
    });
    if (response.status >= 200 && response.status < 300) {
      const { change } = response.body;
      this.snapshot = applyLineupPatch(this.snapshot, change.version, change.patch);
    } else if (response.status === 409 || response.status === 503) {
      // Refused on a stale basis, or rolled back by the database: nothing changed; reload and go on.
      await this.load();
    } else {
      throw new Error(`move refused: ${response.status} ${response.body?.message}`);
    }
    return response;
  }
}
