import type { CatapultStatus, LineupSnapshot } from '@catline/contracts';

const RETRY_PAUSE_MS = 100;
const MAX_FAILURES = 50;

/**
 * A handler who sets one catapult down and up again through one API process, and through the next
 * one when that process stops answering. Each handler owns its catapult, so its basis (the status it
 * last saw) only goes stale when an answer was lost; then it reads the status again and goes on.
 */
export class CatapultToggler {
  accepted = 0;
  private status?: CatapultStatus;

  constructor(
    private readonly urls: readonly string[],
    private at: number,
    private readonly token: string,
    private readonly cycleId: number,
    private readonly catapultId: number,
  ) {}

  /** Sends commands until `count` of them were accepted. */
  async run(count: number): Promise<void> {
    let failures = 0;
    while (this.accepted < count) {
      const outcome = await this.toggle().catch(() => 'unreachable' as const);
      if (outcome === 'accepted') continue;
      failures += 1;
      if (failures > MAX_FAILURES) throw new Error(`Cat ${this.catapultId}: too many refused or lost commands`);
      if (outcome === 'unreachable') this.at = (this.at + 1) % this.urls.length;
      this.status = undefined;
      await new Promise((resolve) => setTimeout(resolve, RETRY_PAUSE_MS));
    }
  }

  private async toggle(): Promise<'accepted' | 'refused' | 'unreachable'> {
    const seen = this.status ?? (await this.readStatus());
    const next: CatapultStatus = seen === 'up' ? 'down' : 'up';
    const response = await this.call('POST', `/lineup/catapults/${this.catapultId}/status`, {
      status: next,
      basisStatus: seen,
      ...(next === 'down' ? { reason: 'Scale-out test' } : {}),
    });
    await response.text();
    if (response.status !== 200) return 'refused';
    this.status = next;
    this.accepted += 1;
    return 'accepted';
  }

  private async readStatus(): Promise<CatapultStatus> {
    const response = await this.call('GET', '/lineup');
    if (response.status !== 200) throw new Error(`Reading the lineup answered ${response.status}`);
    const snapshot = (await response.json()) as LineupSnapshot;
    return snapshot.lanes.find((lane) => lane.catapultId === this.catapultId)!.status;
  }

  private call(method: 'GET' | 'POST', path: string, body?: object): Promise<Response> {
    return fetch(`${this.urls[this.at]}/api/cycles/${this.cycleId}${path}`, {
      method,
      headers: { authorization: `Bearer ${this.token}`, 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  }
}
