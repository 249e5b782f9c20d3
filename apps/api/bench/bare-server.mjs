// The baseline of the fan-out benchmark: a bare socket.io server (no Nest, no database) that
// broadcasts whatever payload it is handed, to the same kind of clients, over the same transport.
// usage: node bench/bare-server.mjs PORT [deflate]; `deflate` turns on per-message compression
// (the ws default threshold: frames of 1 KB and more), to weigh it against the plain server.
import { createServer } from 'node:http';
import { Server } from 'socket.io';

const port = Number(process.argv[2]);
const perMessageDeflate = process.argv[3] === 'deflate' ? { threshold: 1024 } : false;
const http = createServer((request, response) => {
  if (request.method !== 'POST' || request.url !== '/emit') {
    response.writeHead(404).end();
    return;
  }
  const chunks = [];
  request.on('data', (chunk) => chunks.push(chunk));
  request.on('end', () => {
    const change = JSON.parse(Buffer.concat(chunks).toString('utf8'));
    io.to(`cycle:${change.cycleId}`).emit('lineup:change', change);
    response.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify({ version: change.version }));
  });
});
const io = new Server(http, { serveClient: false, perMessageDeflate });
io.on('connection', (socket) => {
  socket.on('cycle:join', ({ cycleId }, ack) => {
    socket.join(`cycle:${cycleId}`);
    ack({ ok: true, mode: 'replay', changes: [] });
  });
});
http.listen(port, '127.0.0.1', () => process.send?.({ ready: true }));
