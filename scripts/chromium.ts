/**
 * Debian's Chromium as the bundle test and the bench start it: headless, no sandbox (they run as
 * root in CI), and none of the background connections this machine's closed network refuses.
 * Never a downloaded browser.
 */
import { accessSync, constants } from 'node:fs';

export const CHROMIUM = '/usr/bin/chromium';

export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

export function haveChromium(): boolean {
  try {
    accessSync(CHROMIUM, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}
