import { epochMs, LaunchMathInputError, seconds, suggestLineup, type SuggestionInput } from '@catline/launch-math';
import { SuggestionPool } from '../src/lineup/suggestion-pool.js';

const start = epochMs(Date.UTC(2026, 5, 1, 9, 0, 0));
const cycle = (taxi: number): SuggestionInput => ({
  cycleStart: start,
  window: { start, end: epochMs(start + 30 * 60_000) },
  catapults: [1, 2].map((number) => ({
    id: `cat${number}`,
    number,
    position: 'bow',
    pairId: 'bow',
    resetInterval: seconds(60),
    up: true,
  })),
  landingAreaInUse: false,
  pairMinimumGap: seconds(10),
  aircraft: ['a', 'b', 'c'].map((id) => ({ id, priority: 'normal' })),
  taxiTimes: { a: { cat1: seconds(taxi) }, b: { cat1: seconds(30), cat2: seconds(90) }, c: { cat2: seconds(45) } },
});

// The pool runs the built worker (apps/api/dist), which the integration run builds first.
describe('the suggestion worker thread', () => {
  const pool = new SuggestionPool();

  afterAll(async () => {
    await pool.onModuleDestroy();
  });

  it('answers with the same lineup as launch-math on the calling thread', async () => {
    expect(await pool.suggest(cycle(20))).toEqual(suggestLineup(cycle(20)));
  });

  it('refuses bad launch data with the same error class and message, which the API maps to a 4xx', async () => {
    const refusal = await pool.suggest(cycle(-5)).catch((error: unknown) => error);
    expect(refusal).toBeInstanceOf(LaunchMathInputError);
    expect((refusal as Error).message).toBe('Taxi time of a to catapult cat1 (s) must not be negative, got -5');
  });
});
