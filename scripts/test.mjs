// `npm test`: the same set-up as `npm start`, then every check. Each runner prints its own
// summary; the last line adds them up. Any failure makes the exit code non-zero.
import { existsSync, mkdirSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import path from 'node:path';
import { stopPrivateMariaDB } from './lib/mariadb.mjs';
import { root, run, step } from './lib/run.mjs';
import { setUp } from './lib/setup.mjs';

const resultsDir = path.join(root, '.data/test-results');
const testScripts = ['test', 'test:integration', 'test:reliability', 'test:cluster', 'test:galera', 'test:e2e'];

function workspacePackages() {
  return ['packages', 'apps'].flatMap((group) =>
    readdirSync(path.join(root, group)).map((name) => {
      const manifest = JSON.parse(readFileSync(path.join(root, group, name, 'package.json'), 'utf8'));
      return { name: manifest.name, dir: `${group}/${name}`, scripts: manifest.scripts ?? {} };
    }),
  );
}

/** Reads the counts of a Jest (--json), Vitest or Playwright (json reporter) result file. */
function countsOf(file) {
  if (!existsSync(file)) return null;
  const report = JSON.parse(readFileSync(file, 'utf8'));
  if (report.stats) {
    const { expected = 0, unexpected = 0, flaky = 0, skipped = 0 } = report.stats;
    return { passed: expected + flaky, failed: unexpected, skipped };
  }
  return {
    passed: report.numPassedTests,
    failed: report.numFailedTests,
    skipped: report.numPendingTests + (report.numTodoTests ?? 0),
  };
}

/**
 * Asks a runner for its counts in a Jest-shaped JSON file: Jest with --json, Vitest with its json
 * reporter (it refuses --json); the Playwright config reads CATLINE_TEST_RESULTS itself.
 */
function resultArgs(command, file) {
  if (/^playwright\b/.test(command)) return [];
  if (/^vitest\b/.test(command)) return ['--reporter=default', '--reporter=json', `--outputFile.json=${file}`];
  return ['--json', `--outputFile=${file}`];
}

const { pnpm, env, startedDatabase } = await setUp({ browser: true });
rmSync(resultsDir, { recursive: true, force: true });
mkdirSync(resultsDir, { recursive: true });

const failures = [];
const totals = { passed: 0, failed: 0, skipped: 0 };
function stage(name, command, args, resultFile) {
  step(name);
  try {
    run(command, args, { env: { ...process.env, ...env, CATLINE_TEST_RESULTS: resultFile ?? '' } });
  } catch (error) {
    failures.push(`${name}: ${error.message}`);
  }
  const counts = resultFile ? countsOf(resultFile) : null;
  if (resultFile && !counts) failures.push(`${name}: wrote no results`);
  if (counts) for (const key of Object.keys(totals)) totals[key] += counts[key];
  // A skipped test proves nothing: a stage that could not run its tests fails the run.
  if (counts?.skipped) failures.push(`${name}: ${counts.skipped} skipped`);
}

stage('Build', pnpm, ['-r', 'build']);
if (failures.length === 0) {
  stage('Type-check', pnpm, ['-r', 'typecheck']);
  stage('Lint', pnpm, ['lint']);
  stage('Format', pnpm, ['format:check']);
  // The OpenAPI document the app serves, linted by Spectral (spectral:oas and apps/api/.spectral.yaml).
  stage('API document', pnpm, ['--filter', '@catline/api', 'lint:api-document']);
  for (const script of testScripts) {
    for (const pkg of workspacePackages().filter((p) => p.scripts[script])) {
      const file = path.join(
        resultsDir,
        `${pkg.name.replace(/^@/, '').replace(/\W+/g, '-')}-${script.replace(':', '-')}.json`,
      );
      stage(
        `${pkg.name} ${script}`,
        pnpm,
        ['--filter', pkg.name, 'run', script, ...resultArgs(pkg.scripts[script], file)],
        file,
      );
    }
  }
}

if (startedDatabase && process.env.CI) stopPrivateMariaDB();
if (failures.length) console.log(`\nFailed stages:\n  ${failures.join('\n  ')}`);
console.log(`\nSummary: ${totals.passed} passed, ${totals.failed} failed, ${totals.skipped} skipped`);
process.exitCode = failures.length || totals.failed ? 1 : 0;
