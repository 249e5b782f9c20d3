// A load process for the fan-out benchmark: opens `count` socket.io clients to one cycle's room and
// records when each change arrives. Driven by fan-out.mjs over IPC.
import { io } from 'socket.io-client';
import { now } from './lib/stats.mjs';

// Clients are spread over `urls` (several API processes sharing one board) in turn.
const { urls, token, origin, cycleId, count } = JSON.parse(process.argv[2]);
const clients = [];

function connect(index) {
  return new Promise((resolve, reject) => {
    const socket = io(urls[index % urls.length], {
      transports: ['websocket'],
      auth: { token },
      extraHeaders: { origin },
      reconnection: false,
      forceNew: true,
    });
    const record = { versions: [], times: [] };
    socket.on('lineup:change', (change) => {
      record.times.push(now());
      record.versions.push(change.version);
    });
    socket.once('connect_error', (error) => reject(new Error(`client ${index}: ${error.message}`)));
    socket.once('connect', () => {
      socket.emit('cycle:join', { cycleId }, (result) => {
        if (!result?.ok) reject(new Error(`client ${index} could not join: ${result?.message}`));
        else resolve({ socket, record });
      });
    });
  });
}

async function connectAll() {
  for (let i = 0; i < count; i += 50) {
    const batch = Array.from({ length: Math.min(50, count - i) }, (_, j) => connect(i + j));
    clients.push(...(await Promise.all(batch)));
  }
}

/** Latency of every arrival against the driver's send time, and any gap, repeat or reordering. */
function report(sendTimes, expected) {
  const latencies = [];
  let missing = 0;
  let outOfOrder = 0;
  let duplicates = 0;
  for (const { record } of clients) {
    const seen = new Set();
    let last = -Infinity;
    record.versions.forEach((version, i) => {
      if (seen.has(version)) duplicates += 1;
      if (version < last) outOfOrder += 1;
      seen.add(version);
      last = version;
      const sent = sendTimes[version];
      if (sent !== undefined) latencies.push(Math.round((record.times[i] - sent) * 100) / 100);
    });
    missing += expected.filter((version) => !seen.has(version)).length;
    record.versions = [];
    record.times = [];
  }
  return { latencies, missing, outOfOrder, duplicates };
}

process.on('message', async (message) => {
  try {
    if (message.cmd === 'connect') {
      await connectAll();
      process.send({ ok: true, connected: clients.length });
    } else if (message.cmd === 'report') {
      process.send({ ok: true, ...report(message.sendTimes, message.expected) });
    } else if (message.cmd === 'close') {
      for (const { socket } of clients) socket.close();
      process.send({ ok: true });
      process.exit(0);
    }
  } catch (error) {
    process.send({ ok: false, error: error.message });
  }
});
