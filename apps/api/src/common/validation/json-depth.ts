import type { IncomingMessage, ServerResponse } from 'node:http';
import { RequestException } from '../errors/request.exception.js';

/** No request of ours nests deeper than a few levels; this leaves room and keeps transforms from recursing. */
export const JSON_MAX_DEPTH = 32;

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const OPENERS = new Set([0x5b, 0x7b]);
const CLOSERS = new Set([0x5d, 0x7d]);

/**
 * Whether JSON text nests arrays and objects deeper than `limit`, read from the raw bytes before any
 * parsing (brackets inside strings are text). UTF-8 multi-byte characters never hold these ASCII bytes.
 */
export function nestsDeeperThan(text: Uint8Array, limit: number): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i += 1) {
    const byte = text[i];
    if (inString) {
      if (byte === BACKSLASH) i += 1;
      else if (byte === QUOTE) inString = false;
    } else if (byte === QUOTE) {
      inString = true;
    } else if (OPENERS.has(byte)) {
      depth += 1;
      if (depth > limit) return true;
    } else if (CLOSERS.has(byte)) {
      depth -= 1;
    }
  }
  return false;
}

/**
 * The JSON body parser's `verify` hook: a body nested deeper than JSON_MAX_DEPTH is refused with 400
 * before it is parsed, where the validation's transform would otherwise recurse into a stack overflow.
 */
export function refuseDeepJson(_request: IncomingMessage, _response: ServerResponse, body: Buffer): void {
  if (nestsDeeperThan(body, JSON_MAX_DEPTH)) {
    throw new RequestException(
      'json_too_deep',
      `The request body is nested more than ${JSON_MAX_DEPTH} levels deep; nothing was read.`,
    );
  }
}
