import type { INestApplication } from '@nestjs/common';
import type { OpenAPIObject } from '@nestjs/swagger';
import request from 'supertest';
import { type ContractView, contractViews } from './support/contract-views.js';
import { startTestApp } from './support/test-app.js';

interface ObjectSchema {
  properties?: Record<string, unknown>;
  required?: string[];
}

/**
 * How the document's schema of a view disagrees with its contract type: a field one names and the other
 * does not, or a field optional in one and required in the other.
 */
function disagreements(view: ContractView, schema: ObjectSchema): string[] {
  const documented = Object.keys(schema.properties ?? {});
  const required = new Set(schema.required ?? []);
  const inContract = new Set(view.fields.map((field) => field.name));
  const where = `${view.schema} (contract ${view.contract})`;
  return [
    ...view.fields
      .filter((field) => !documented.includes(field.name))
      .map((field) => `${where}: ${field.name}${field.optional ? '?' : ''} is in the contract, not in the document`),
    ...documented
      .filter((name) => !inContract.has(name))
      .map((name) => `${where}: ${name} is in the document, not in the contract`),
    ...view.fields
      .filter((field) => documented.includes(field.name) && field.optional === required.has(field.name))
      .map(
        (field) =>
          `${where}: ${field.name} is ${field.optional ? 'optional' : 'required'} in the contract, ${field.optional ? 'required' : 'optional'} in the document`,
      ),
  ];
}

// The alternative to a generated client: the contracts' view types, which the web app reads its answers
// as, and the schemas the served document gives a client agree field for field.
describe('the contracts and the API document', () => {
  let app: INestApplication;
  let document: OpenAPIObject;
  let views: ContractView[];

  beforeAll(async () => {
    let url: string;
    ({ app, url } = await startTestApp());
    document = (await request(url).get('/api/docs-json').expect(200)).body as OpenAPIObject;
    views = contractViews();
  }, 180_000);

  afterAll(async () => {
    await app.close();
  });

  it('finds the view classes that implement a contract type', () => {
    expect(views.length).toBeGreaterThan(50);
  });

  it('has a schema for every view class that implements a contract type', () => {
    const schemas = document.components?.schemas ?? {};
    expect(views.filter((view) => !schemas[view.schema]).map((view) => view.schema)).toEqual([]);
  });

  it("names each contract view type's fields in its schema, optional where the contract has them optional", () => {
    const schemas = (document.components?.schemas ?? {}) as Record<string, ObjectSchema>;
    const found = views.filter((view) => schemas[view.schema]);
    expect(found.flatMap((view) => disagreements(view, schemas[view.schema]))).toEqual([]);
  });
});
