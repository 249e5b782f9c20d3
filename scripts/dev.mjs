// `npm run dev`: Vite on :5173 (proxying /api) and the API in watch mode on :3000.
import { run, runAsync, step } from './lib/run.mjs';
import { setUp } from './lib/setup.mjs';

const { pnpm } = await setUp();
step('Building the shared packages, migrating and seeding');
run(pnpm, ['--filter', './packages/*', 'build']);
run(pnpm, ['--filter', '@catline/api', 'build']);
run(pnpm, ['--filter', '@catline/api', 'db:migrate']);
run(pnpm, ['--filter', '@catline/api', 'db:seed']);
step('Watching: web on http://127.0.0.1:5173, API on http://127.0.0.1:3000/api');
const { exited } = runAsync(pnpm, ['--parallel', '-r', 'dev']);
process.on('SIGINT', () => {});
process.exitCode = await exited;
