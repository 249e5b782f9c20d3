import { fileURLToPath } from 'node:url';
import { LaunchMathInputError, type LineupSuggestion, type SuggestionInput } from '@catline/launch-math';
import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import { Piscina } from 'piscina';
import type { SuggestionOutcome } from './suggestion.worker.js';

// Always the built worker: the integration tests run this module from its TypeScript source (after
// building), and a worker thread cannot load TypeScript.
const WORKER = fileURLToPath(new URL('../../dist/lineup/suggestion.worker.js', import.meta.url));

/**
 * launch-math's suggested lineup on a worker thread. The search takes hundreds of milliseconds for a
 * full deck; on the API's own thread every request and broadcast would wait behind it. One thread is
 * enough (a suggestion is asked for by hand); more requests queue for it.
 */
@Injectable()
export class SuggestionPool implements OnModuleDestroy {
  private readonly pool = new Piscina<SuggestionInput, SuggestionOutcome>({
    filename: WORKER,
    minThreads: 0,
    maxThreads: 1,
    idleTimeout: 60_000,
  });

  async suggest(input: SuggestionInput): Promise<LineupSuggestion> {
    const outcome = await this.pool.run(input);
    if ('refusal' in outcome) throw new LaunchMathInputError(outcome.refusal);
    return outcome.suggestion;
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool.close();
  }
}
