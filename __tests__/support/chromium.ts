/** Debian's chromium; tests never download a browser of their own. */
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/**
 * Flags that run headless as root on a machine with no outside network. playwright-core adds
 * --headless and a fresh temporary profile (user data dir) itself.
 */
export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];
