// Commit rate: lineup moves per second through the real API with 1, 4 and 16 concurrent handlers,
// against the same number of plain single-row transactions through mysql2 as the baseline. Each count
// runs `runs` times (5 by default), Catline and baseline in turn, and reports the median with the spread:
// one run on a shared machine says little.
// usage: node bench/commit-rate.mjs '{"url","cycleId","handlers":[1,4,16],"commands":800,"runs":5,"db":{...}}'
import { createPool } from 'mysql2/promise';
import { signIn } from './lib/http.mjs';
import { median, now } from './lib/stats.mjs';
import { TogglingHandler } from './lib/toggling-handler.mjs';

const options = JSON.parse(process.argv[2]);

async function catlineRun(handlerCount, token) {
  const handlers = Array.from({ length: handlerCount }, () => new TogglingHandler(options.url, token, options.cycleId));
  const snapshot = await handlers[0].load();
  await Promise.all(handlers.slice(1).map((handler) => handler.load()));
  const lanes = snapshot.lanes.filter((lane) => lane.status === 'up' && !lane.closed).map((lane) => lane.catapultId);
  const slots = [...snapshot.pool, ...snapshot.lanes.flatMap((lane) => lane.slotIds)];
  const perHandler = Math.ceil(options.commands / handlerCount);
  const counts = { accepted: 0, conflicts: 0, busy: 0, refused: 0 };
  const started = now();
  await Promise.all(
    handlers.map(async (handler, h) => {
      for (let i = 0; i < perHandler; i += 1) {
        const { status } = await handler.toggle(slots[h], lanes[h % lanes.length]);
        if (status < 300) counts.accepted += 1;
        else if (status === 409) counts.conflicts += 1;
        else if (status === 503) counts.busy += 1;
        else counts.refused += 1;
      }
    }),
  );
  const seconds = (now() - started) / 1000;
  return {
    handlers: handlerCount,
    ...counts,
    seconds: Math.round(seconds * 100) / 100,
    acceptedPerSecond: Math.round(counts.accepted / seconds),
  };
}

async function mysqlRun(concurrency, pool) {
  await pool.query('CREATE TABLE IF NOT EXISTS bench_counter (id INT PRIMARY KEY, n INT NOT NULL) ENGINE=InnoDB');
  await pool.query('DELETE FROM bench_counter');
  await pool.query(
    `INSERT INTO bench_counter VALUES ${Array.from({ length: concurrency }, (_, i) => `(${i}, 0)`).join(',')}`,
  );
  const perWorker = Math.ceil(options.commands / concurrency);
  const started = now();
  await Promise.all(
    Array.from({ length: concurrency }, async (_, worker) => {
      const connection = await pool.getConnection();
      try {
        for (let i = 0; i < perWorker; i += 1) {
          await connection.beginTransaction();
          await connection.query('UPDATE bench_counter SET n = n + 1 WHERE id = ?', [worker]);
          await connection.commit();
        }
      } finally {
        connection.release();
      }
    }),
  );
  const seconds = (now() - started) / 1000;
  return {
    transactions: perWorker * concurrency,
    seconds: Math.round(seconds * 100) / 100,
    perSecond: Math.round((perWorker * concurrency) / seconds),
  };
}

const runs = options.runs ?? 5;
const round2 = (value) => Math.round(value * 100) / 100;

const token = await signIn(options.url, 'handler@catline.example');
const pool = createPool({ ...options.db, connectionLimit: Math.max(...options.handlers) });
const results = [];
try {
  for (const handlers of options.handlers) {
    const rounds = [];
    for (let run = 0; run < runs; run += 1) {
      const catline = await catlineRun(handlers, token);
      const mysql = await mysqlRun(handlers, pool);
      rounds.push({
        ...catline,
        baselinePerSecond: mysql.perSecond,
        ratio: catline.acceptedPerSecond / mysql.perSecond,
      });
    }
    const ratios = rounds.map((round) => round.ratio);
    results.push({
      handlers,
      runs,
      acceptedPerSecond: median(rounds.map((round) => round.acceptedPerSecond)),
      baselinePerSecond: median(rounds.map((round) => round.baselinePerSecond)),
      ratio: round2(median(ratios)),
      ratioMin: round2(Math.min(...ratios)),
      ratioMax: round2(Math.max(...ratios)),
      conflicts: rounds.reduce((sum, round) => sum + round.conflicts, 0),
      busy: rounds.reduce((sum, round) => sum + round.busy, 0),
      refused: rounds.reduce((sum, round) => sum + round.refused, 0),
    });
    console.error(`commit rate with ${handlers} handlers done (${runs} runs)`);
  }
} finally {
  await pool.end();
}
console.log(JSON.stringify(results));
