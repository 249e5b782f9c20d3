/** The demo sign-ins that the seed creates (apps/api/src/database/seeds). */
export const DEMO_SIGN_INS = [
  ['admin', 'admin@catline.example'],
  ['air operations', 'airops@catline.example'],
  ['air boss', 'airboss@catline.example'],
  ['handler', 'handler@catline.example'],
  ['catapult officers', 'cat1@catline.example … cat4@catline.example'],
  ['deck edge operators', 'deo1@catline.example, deo2@catline.example'],
  ['pilot', 'pilot@catline.example'],
  ['observer', 'observer@catline.example'],
];

/** Called once the build is done: the demo password is read from the built contracts package. */
export async function printBanner(port) {
  const { DEMO_PASSWORD } = await import('../../packages/contracts/dist/index.js');
  const lines = [
    `Catline is running at http://127.0.0.1:${port}  (API under /api, docs at /api/docs)`,
    `Demo sign-ins, all with the password "${DEMO_PASSWORD}":`,
    ...DEMO_SIGN_INS.map(([role, email]) => `  ${role.padEnd(19)} ${email}`),
    'Ctrl-C stops the app; `npm run db:stop` stops MariaDB.',
  ];
  console.log(`\n${lines.join('\n')}\n`);
}
