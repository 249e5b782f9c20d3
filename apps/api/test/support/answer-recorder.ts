import type { IncomingMessage, Server, ServerResponse } from 'node:http';
import { brotliDecompressSync, gunzipSync, inflateSync } from 'node:zlib';
import type { INestApplication } from '@nestjs/common';
import type { Answer } from './documented-answers.js';

/** One answer the app gave, with the request it answered. */
export interface RecordedAnswer extends Answer {
  method: string;
  /** The address asked for, query left out. */
  address: string;
  /** The route that answered, as Express names it (`/api/cycles/:cycleId`), when one did. */
  route?: string;
}

const DECOMPRESS: Record<string, (data: Buffer) => Buffer> = {
  gzip: gunzipSync,
  deflate: inflateSync,
  br: brotliDecompressSync,
};

/** The body as the client reads it: the bytes written, decompressed when compression wrote them. */
function textOf(chunks: Buffer[], encoding: string | undefined): string {
  const bytes = Buffer.concat(chunks);
  const decompress = encoding ? DECOMPRESS[encoding] : undefined;
  return (decompress ? decompress(bytes) : bytes).toString('utf8');
}

const asBuffer = (chunk: unknown) =>
  Buffer.isBuffer(chunk) ? chunk : typeof chunk === 'string' ? Buffer.from(chunk) : Buffer.from(chunk as Uint8Array);

/**
 * Records every /api answer the app gives from now on, whichever test or helper asked, so that a spec can
 * hold them against the document at its end (`DocumentedAnswers.problemsOf`). It listens on the HTTP
 * server ahead of Express and keeps what the response writes.
 */
export function recordAnswers(app: INestApplication): RecordedAnswer[] {
  const recorded: RecordedAnswer[] = [];
  const server = app.getHttpServer() as Server;
  server.prependListener('request', (req: IncomingMessage & { route?: { path?: string } }, res: ServerResponse) => {
    if (!req.url?.startsWith('/api/')) return;
    const address = req.url.split('?')[0];
    const chunks: Buffer[] = [];
    const write = res.write.bind(res) as (...args: unknown[]) => boolean;
    const end = res.end.bind(res) as (...args: unknown[]) => ServerResponse;
    res.write = ((chunk: unknown, ...rest: unknown[]) => {
      if (chunk) chunks.push(asBuffer(chunk));
      return write(chunk, ...rest);
    }) as typeof res.write;
    res.end = ((chunk: unknown, ...rest: unknown[]) => {
      if (chunk && typeof chunk !== 'function') chunks.push(asBuffer(chunk));
      return end(chunk, ...rest);
    }) as typeof res.end;
    res.on('finish', () => {
      const text = textOf(chunks, res.getHeader('content-encoding') as string | undefined);
      const contentType = String(res.getHeader('content-type') ?? '');
      let body: unknown = text;
      if (contentType.startsWith('application/json') && text) body = JSON.parse(text);
      recorded.push({
        method: req.method ?? 'GET',
        address,
        route: typeof req.route?.path === 'string' ? req.route.path : undefined,
        status: res.statusCode,
        body,
        text,
        headers: { 'content-type': contentType },
      });
    });
  });
  return recorded;
}
