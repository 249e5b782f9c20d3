import http from 'node:http';
import { connect } from 'node:net';
import httpProxy from 'http-proxy';

const HEALTH_EVERY_MS = 500;

function answers(target) {
  const { hostname, port } = new URL(target);
  return new Promise((resolve) => {
    const socket = connect({ host: hostname, port: Number(port) });
    socket.setTimeout(1_000, () => socket.destroy());
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
    socket.once('timeout', () => resolve(false));
  });
}

/**
 * The front door of `npm run start:cluster`: each HTTP request and each websocket upgrade goes to the
 * next API process that answers (round robin); one that stops answering is left out until it is
 * back. Nothing is sticky: the app's socket.io clients use the websocket transport only, so a
 * connection lives on one process from start to end, and the REST API keeps no state in a process.
 */
export function startClusterProxy({ port, host = '127.0.0.1', targets }) {
  const proxy = httpProxy.createProxyServer({ xfwd: true });
  const live = new Set(targets);
  let turn = 0;
  const pick = () => {
    const candidates = targets.filter((target) => live.has(target));
    turn = (turn + 1) % Math.max(1, candidates.length);
    return candidates[turn] ?? null;
  };

  proxy.on('error', (error, request, response, target) => {
    if (target) live.delete(typeof target === 'string' ? target : `http://${target.host}`);
    if (response instanceof http.ServerResponse) {
      if (!response.headersSent) response.writeHead(502, { 'content-type': 'text/plain' });
      response.end('The Catline API process did not answer; try again.');
    } else {
      response?.destroy?.();
    }
  });

  const server = http.createServer((request, response) => {
    const target = pick();
    if (!target) {
      response.writeHead(503, { 'content-type': 'text/plain' }).end('No Catline API process is running.');
      return;
    }
    proxy.web(request, response, { target });
  });
  server.on('upgrade', (request, socket, head) => {
    const target = pick();
    if (!target) socket.destroy();
    else proxy.ws(request, socket, head, { target });
  });

  const health = setInterval(async () => {
    for (const target of targets) {
      if (await answers(target)) live.add(target);
      else live.delete(target);
    }
  }, HEALTH_EVERY_MS);

  const listening = new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, resolve);
  });
  return {
    listening,
    close() {
      clearInterval(health);
      server.closeAllConnections?.();
      server.close();
      proxy.close();
    },
  };
}
