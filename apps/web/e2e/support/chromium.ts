/**
 * Debian's Chromium as the browser tests start it: headless as root, with nothing that reaches out to
 * the network on its own (this machine's network is closed).
 */
export const debianChromium = {
  executablePath: '/usr/bin/chromium',
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
};
