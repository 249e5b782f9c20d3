import { read, run, step } from './run.mjs';

function isInstalled(pkg) {
  return read('dpkg-query', ['-W', '-f=${Status}', pkg]) === 'install ok installed';
}

/**
 * Installs missing Debian packages: directly as root, through sudo otherwise,
 * and stops with the exact command to run where neither is possible.
 */
export function ensureDebianPackages(packages) {
  const missing = packages.filter((pkg) => !isInstalled(pkg));
  if (missing.length === 0) return;
  const isRoot = process.getuid?.() === 0;
  if (!isRoot && !read('sh', ['-c', 'command -v sudo'])) {
    throw new Error(
      `Catline needs these Debian packages: ${missing.join(', ')}.\n` +
        `As root, run: apt-get update && apt-get install -y ${missing.join(' ')}`,
    );
  }
  step(`Installing Debian packages: ${missing.join(' ')}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const aptGet = (...args) => (isRoot ? run('apt-get', args, { env }) : run('sudo', ['apt-get', ...args], { env }));
  aptGet('update', '-qq');
  aptGet('install', '-y', '-qq', '--no-install-recommends', ...missing);
}
