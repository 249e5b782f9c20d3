import type { OpenAPIObject } from '@nestjs/swagger';
import { Ajv, type ValidateFunction } from 'ajv';
import addFormatsModule from 'ajv-formats';
import request from 'supertest';
import type { RecordedAnswer } from './answer-recorder.js';

// ajv-formats is CommonJS: its function is the default export's default under ESM.
const addFormats = addFormatsModule as unknown as typeof addFormatsModule.default;

/** What a test got from the app, as supertest gives it. */
export interface Answer {
  status: number;
  body: unknown;
  text?: string;
  headers: Record<string, string>;
}

interface DocumentedResponse {
  description: string;
  content?: Record<string, { schema?: object }>;
}

type Schema = Record<string, unknown>;

const DOCUMENT_ID = 'catline-api';

/**
 * A schema of the document (OpenAPI 3.0) as JSON Schema for ajv, and closed: `nullable` becomes a
 * null alternative, and an object that lists its properties takes no other, so an answer with a field
 * the document does not name fails as one without a field it requires does.
 */
function closed(schema: unknown): unknown {
  if (Array.isArray(schema)) return schema.map(closed);
  if (typeof schema !== 'object' || schema === null) return schema;
  const { nullable, ...rest } = schema as Schema;
  const node: Schema = {};
  for (const [key, value] of Object.entries(rest)) {
    if (key === 'properties') {
      node.properties = Object.fromEntries(Object.entries(value as Schema).map(([name, sub]) => [name, closed(sub)]));
    } else if (key === '$ref') {
      node.$ref = (value as string).replace(/^#/, `${DOCUMENT_ID}#`);
    } else node[key] = closed(value);
  }
  if (node.properties && node.additionalProperties === undefined) node.additionalProperties = false;
  return nullable === true ? { anyOf: [node, { type: 'null' }] } : node;
}

/** The codes a documented refusal names (route-docs.ts writes them as "Codes: `a`, `b`."). */
const codesOf = (response: DocumentedResponse) =>
  [...(/Codes: (.*)\.$/.exec(response.description)?.[1] ?? '').matchAll(/`(\w+)`/g)].map((match) => match[1]);

/**
 * Holds the answers the tests really got against the document the app serves: each answer's status
 * must be one its operation lists, a success body must fit the documented schema (closed, see above)
 * and a refusal must be the one error shape with a code the operation lists for that status.
 */
export class DocumentedAnswers {
  private readonly ajv = new Ajv({ allErrors: true, strict: false });
  private readonly validators = new Map<string, ValidateFunction>();

  private constructor(private readonly document: OpenAPIObject) {
    addFormats(this.ajv);
    this.ajv.addSchema({ $id: DOCUMENT_ID, components: closed(document.components) as object });
  }

  /** The document the app at `url` serves. */
  static async of(url: string): Promise<DocumentedAnswers> {
    const served = await request(url).get('/api/docs-json').expect(200);
    return new DocumentedAnswers(served.body as OpenAPIObject);
  }

  /**
   * The documented path (`/api/cycles/{cycleId}`) an address (`/api/cycles/12?x=1`) is an instance of; a
   * path with fewer placeholders first, so that `/api/users/me` is not taken for `/api/users/{userId}`.
   */
  pathOf(address: string): string | undefined {
    const bare = address.split('?')[0];
    const placeholders = (path: string) => path.split('{').length;
    return Object.keys(this.document.paths)
      .sort((a, b) => placeholders(a) - placeholders(b))
      .find((path) => new RegExp(`^${path.replace(/\./g, '\\.').replace(/\{\w+\}/g, '[^/]+')}$`).test(bare));
  }

  /**
   * How the answers a recorder kept (see answer-recorder.ts) disagree with the document, once each. An
   * answer to no documented operation (an unknown path's 404, a 405, a HEAD) is left out: the document
   * describes operations.
   */
  problemsOf(answers: readonly RecordedAnswer[]): string[] {
    const problems = new Set<string>();
    for (const answer of answers) {
      const named = answer.route?.replace(/:(\w+)/g, '{$1}');
      const path = named && this.document.paths[named] ? named : this.pathOf(answer.address);
      const operations = path ? (this.document.paths[path] as Record<string, unknown>) : undefined;
      if (!path || !operations?.[answer.method.toLowerCase()]) continue;
      for (const problem of this.problems(answer.method, path, answer)) problems.add(problem);
    }
    return [...problems];
  }

  /** How `answer` to `method path` (as documented) disagrees with the document; empty when it agrees. */
  problems(method: string, path: string, answer: Answer): string[] {
    const operation = `${method.toUpperCase()} ${path}`;
    const operations = this.document.paths[path] as Record<string, { responses: Record<string, DocumentedResponse> }>;
    const documented = operations?.[method.toLowerCase()]?.responses?.[String(answer.status)];
    const refusal = answer.body as { code?: unknown };
    const what = `${operation} answered ${answer.status}${answer.status >= 400 ? ` ${String(refusal?.code)}` : ''}`;
    if (!documented) return [`${what}, a status the document does not list for it`];

    const contentType = (answer.headers['content-type'] ?? '').split(';')[0].trim();
    const hasBody = (answer.text ?? '').length > 0;
    if (!documented.content) return hasBody ? [`${what} with a body, where the document gives none`] : [];
    const media = documented.content[contentType];
    if (!media) {
      const listed = Object.keys(documented.content).join(', ');
      return [`${what} as ${contentType || 'no content'}, where the document gives ${listed}`];
    }
    const problems: string[] = [];
    if (answer.status >= 400 && !codesOf(documented).includes(String(refusal?.code))) {
      problems.push(`${what}, a code the document does not list for ${answer.status}`);
    }
    if (contentType !== 'application/json' || !media.schema) return problems;
    const key = `${operation} ${answer.status}`;
    if (!this.validators.has(key)) this.validators.set(key, this.ajv.compile(closed(media.schema) as object));
    const validate = this.validators.get(key)!;
    if (!validate(answer.body)) {
      // A nullable field's null alternative adds two errors that say nothing the other branch does not.
      const telling = (validate.errors ?? []).filter(
        (error) => error.keyword !== 'anyOf' && error.message !== 'must be null',
      );
      for (const error of telling) {
        // Items of a list fail alike: one line for all of them.
        const at = error.instancePath.replace(/\/\d+(?=\/|$)/g, '/*') || '(body)';
        const detail =
          error.params && 'additionalProperty' in error.params ? ` (${error.params.additionalProperty})` : '';
        problems.push(`${what}: ${at} ${error.message}${detail}`);
      }
    }
    return [...new Set(problems)];
  }
}
