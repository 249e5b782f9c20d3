// `npm start`: set everything up on a fresh machine, then serve web and API from one process.
import { printBanner } from './lib/demo.mjs';
import { ensureMailCatcher } from './lib/mail-catcher.mjs';
import { run, runAsync, step } from './lib/run.mjs';
import { setUp } from './lib/setup.mjs';

const { pnpm, env } = await setUp();
step('Building the packages, the API and the web app');
run(pnpm, ['-r', 'build']);
step('Applying database migrations and the demo seed');
run(pnpm, ['--filter', '@catline/api', 'db:migrate']);
run(pnpm, ['--filter', '@catline/api', 'db:seed']);

const mail = await ensureMailCatcher({ ...process.env, ...env });

const { child, exited } = runAsync('node', ['apps/api/dist/main.js'], {
  env: { ...process.env, NODE_ENV: 'production' },
});
// Ctrl-C reaches the server too (same process group); wait for its clean shutdown.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => {
  child.kill('SIGTERM');
  mail.child?.kill('SIGTERM');
});
child.once('spawn', () =>
  setTimeout(async () => {
    await printBanner(env.PORT);
    if (mail.inbox)
      console.log(`Mail the app sends (invitations, password links, cycle summaries) is caught at ${mail.inbox}\n`);
  }, 1500),
);
process.exitCode = await exited;
mail.child?.kill('SIGTERM');
