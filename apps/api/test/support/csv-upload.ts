import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { bearer } from './sign-in.js';

export interface CsvFile {
  content: string | Buffer;
  fileName?: string;
  contentType?: string;
}

/** Sends a file as the multipart field `file`, as a browser's file input does. */
export function uploadCsv(baseUrl: string, token: string, path: string, file: CsvFile): request.Test {
  const content = typeof file.content === 'string' ? Buffer.from(file.content, 'utf8') : file.content;
  return request(baseUrl)
    .post(path)
    .set(bearer(token))
    .attach('file', content, { filename: file.fileName ?? 'plan.csv', contentType: file.contentType ?? 'text/csv' });
}

/** The same multipart body written out, for callers that send raw headers and body (the role matrix). */
export function multipartCsv(text: string, fileName = 'plan.csv'): { headers: Record<string, string>; body: Buffer } {
  const boundary = `----catline${randomBytes(8).toString('hex')}`;
  const body = Buffer.from(
    [
      `--${boundary}`,
      `Content-Disposition: form-data; name="file"; filename="${fileName}"`,
      'Content-Type: text/csv',
      '',
      text,
      `--${boundary}--`,
      '',
    ].join('\r\n'),
  );
  return { headers: { 'Content-Type': `multipart/form-data; boundary=${boundary}` }, body };
}
