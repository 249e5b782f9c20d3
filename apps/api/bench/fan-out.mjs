// Fan-out latency: N socket.io clients in separate load processes joined to one cycle; a handler
// sends lineup moves through the real API (paced, then as a burst) and every client's arrival time
// is set against the time the command was sent. The same payloads then go through a bare socket.io
// server to the same number of clients, for the ratio, and, at the sizes in `deflateClients`, through
// the bare server with per-message deflate on: Catline keeps deflate off unless that costs ≤ 1.1×.
// usage: node bench/fan-out.mjs '{"url","urls"?,"origin","cycleId","clients":[100,...],"moves":200,"perSecond":2,
//   "barePort","deflateClients":[1000]}'; the deflating bare server takes barePort + 1.
// `urls` (default [url]) spreads the clients over several API processes; the handler sends to `url`.
import { fork } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { signIn } from './lib/http.mjs';
import { now, summarize } from './lib/stats.mjs';
import { TogglingHandler } from './lib/toggling-handler.mjs';

const LOAD_PROCESSES = 2;
const here = (file) => fileURLToPath(new URL(file, import.meta.url));
const options = JSON.parse(process.argv[2]);
const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

function ask(child, message) {
  return new Promise((resolve, reject) => {
    child.once('message', (answer) => (answer.ok ? resolve(answer) : reject(new Error(answer.error))));
    child.send(message);
  });
}

async function openClients(urls, token, total) {
  const share = Math.ceil(total / LOAD_PROCESSES);
  const loads = Array.from({ length: LOAD_PROCESSES }, (_, i) =>
    fork(here('./fan-out-clients.mjs'), [
      JSON.stringify({
        urls,
        token,
        origin: options.origin,
        cycleId: options.cycleId,
        count: Math.min(share, total - i * share),
      }),
    ]),
  );
  await Promise.all(loads.map((load) => ask(load, { cmd: 'connect' })));
  return loads;
}

async function collect(loads, sendTimes) {
  const expected = Object.keys(sendTimes).map(Number);
  await sleep(1_000); // let the last broadcasts land
  const reports = await Promise.all(loads.map((load) => ask(load, { cmd: 'report', sendTimes, expected })));
  return {
    ...summarize(reports.flatMap((r) => r.latencies)),
    missing: reports.reduce((sum, r) => sum + r.missing, 0),
    outOfOrder: reports.reduce((sum, r) => sum + r.outOfOrder, 0),
    duplicates: reports.reduce((sum, r) => sum + r.duplicates, 0),
  };
}

/** Runs `send(i)` `count` times, at `perSecond` or as fast as answers come; returns send times by version. */
async function drive(count, perSecond, send) {
  const sendTimes = {};
  const started = now();
  for (let i = 0; i < count; i += 1) {
    const sentAt = now();
    const version = await send(i);
    if (version !== null) sendTimes[version] = sentAt;
    if (perSecond) await sleep(Math.max(0, started + ((i + 1) * 1000) / perSecond - now()));
  }
  return sendTimes;
}

async function measureCatline(clients, handlerToken, observerToken) {
  const handler = new TogglingHandler(options.url, handlerToken, options.cycleId);
  const snapshot = await handler.load();
  const slots = snapshot.pool.slice(0, 4);
  const lanes = snapshot.lanes.filter((lane) => lane.status === 'up' && !lane.closed).map((lane) => lane.catapultId);
  const payloads = { paced: [], burst: [] };
  const move = (kind) => async (i) => {
    const response = await handler.toggle(slots[i % slots.length], lanes[i % lanes.length]);
    if (response.status >= 300) return null;
    payloads[kind].push(response.body.change);
    return response.body.version;
  };
  const loads = await openClients(options.urls ?? [options.url], observerToken, clients);
  try {
    const paced = await collect(loads, await drive(options.moves, options.perSecond, move('paced')));
    const burst = await collect(loads, await drive(options.moves, 0, move('burst')));
    return { result: { paced, burst }, payloads };
  } finally {
    await Promise.all(loads.map((load) => ask(load, { cmd: 'close' })));
  }
}

async function measureBare(clients, bareUrl, payloads) {
  const emit = (list) => async (i) => {
    await fetch(`${bareUrl}/emit`, { method: 'POST', body: JSON.stringify(list[i]) });
    return list[i].version;
  };
  const loads = await openClients([bareUrl], 'none', clients);
  try {
    const paced = await collect(loads, await drive(payloads.paced.length, options.perSecond, emit(payloads.paced)));
    const burst = await collect(loads, await drive(payloads.burst.length, 0, emit(payloads.burst)));
    return { paced, burst };
  } finally {
    await Promise.all(loads.map((load) => ask(load, { cmd: 'close' })));
  }
}

async function startBare(port, ...flags) {
  const server = fork(here('./bare-server.mjs'), [String(port), ...flags]);
  await new Promise((resolve) => server.once('message', resolve));
  return { server, url: `http://127.0.0.1:${port}` };
}

const bare = await startBare(options.barePort);
const deflating = await startBare(options.barePort + 1, 'deflate');
const results = [];
try {
  for (const clients of options.clients) {
    // Fresh tokens for every size: access tokens last 15 minutes.
    const handlerToken = await signIn(options.url, 'handler@catline.example');
    const observerToken = await signIn(options.url, 'observer@catline.example');
    const catline = await measureCatline(clients, handlerToken, observerToken);
    const baseline = await measureBare(clients, bare.url, catline.payloads);
    const deflate = options.deflateClients?.includes(clients)
      ? await measureBare(clients, deflating.url, catline.payloads)
      : null;
    const payloadBytes = Math.round(
      catline.payloads.paced.reduce((sum, change) => sum + JSON.stringify(change).length, 0) /
        Math.max(1, catline.payloads.paced.length),
    );
    const ratio = (a, b) => (a && b ? Math.round((a / b) * 100) / 100 : null);
    results.push({
      clients,
      payloadBytes,
      catline: catline.result,
      bare: baseline,
      deflate,
      ratio: {
        pacedP50: ratio(catline.result.paced.p50, baseline.paced.p50),
        pacedP99: ratio(catline.result.paced.p99, baseline.paced.p99),
        burstP50: ratio(catline.result.burst.p50, baseline.burst.p50),
        burstP99: ratio(catline.result.burst.p99, baseline.burst.p99),
        deflatePacedP99: deflate && ratio(deflate.paced.p99, baseline.paced.p99),
        deflateBurstP99: deflate && ratio(deflate.burst.p99, baseline.burst.p99),
      },
    });
    console.error(`fan-out ${clients} clients done`);
  }
} finally {
  bare.server.kill();
  deflating.server.kill();
}
console.log(JSON.stringify(results));
