import 'reflect-metadata';
import type { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { AppModule } from '../../src/app.module.js';
import { configureApp } from '../../src/app.setup.js';
import { shareSocketRoomsWhenConfigured } from '../../src/gateway/redis-io.adapter.js';
import { recordAnswers } from './answer-recorder.js';
import { DocumentedAnswers } from './documented-answers.js';

/**
 * Holds every answer the app gives, whichever spec or helper asked, against the document it serves when
 * the spec closes it: the close fails, and with it the spec's afterAll, on an answer the document does not
 * describe. Checked at close rather than in a last spec because Jest orders the files of a run by their
 * past durations, not by name, and a spec run alone is checked too; each file gets its own app and record.
 */
function holdAnswersToDocument(app: INestApplication, url: string): void {
  const answers = recordAnswers(app);
  const close = app.close.bind(app);
  app.close = async () => {
    const problems = (await DocumentedAnswers.of(url)).problemsOf(answers);
    await close();
    if (problems.length > 0) {
      throw new Error(`Answers the API document does not describe:\n${problems.map((line) => `- ${line}`).join('\n')}`);
    }
  };
}

/** The whole API (DB_NAME is the test database, set by global-setup.mjs), configured as main.ts does, on the test database and a free loopback port. */
export async function startTestApp(): Promise<{ app: INestApplication; url: string }> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication({ logger: ['error', 'warn'] });
  configureApp(app);
  await shareSocketRoomsWhenConfigured(app);
  await app.listen(0, '127.0.0.1');
  const url = await app.getUrl();
  holdAnswersToDocument(app, url);
  return { app, url };
}
