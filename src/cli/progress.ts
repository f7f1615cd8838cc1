/**
 * A progress bar on stderr for big workbooks (cli-progress), one stage after another — reading,
 * calculating, writing — each with the share of its own work done; nothing at all when stderr is
 * not a terminal (a pipe, a log file, CI), so output stays clean. The bar hides the cursor and
 * turns line wrapping off while it is drawn; `restoreTerminal` gives both back, also on Ctrl-C.
 */
import { SingleBar } from 'cli-progress';

/** Packages this big take long enough to be worth a bar (about 20,000 formula rows). */
export const BAR_INPUT_BYTES = 1024 * 1024;

export interface Progress {
  /** `done` of `total` in the stage named. */
  update(stage: string, done: number, total: number): void;
  stop(): void;
}

const silent: Progress = { update() {}, stop() {} };

export function wantsBar(inputBytes: number): boolean {
  return inputBytes > BAR_INPUT_BYTES;
}

/** Cursor shown, line wrapping on (DEC private modes 25 and 7). */
export const RESTORE_TERMINAL = '\u001b[?25h\u001b[?7h';

let active: { stream: NodeJS.WriteStream; bar: SingleBar } | undefined;

/** Clears a bar that is drawn and gives the terminal its cursor and wrapping back. */
export function restoreTerminal(): void {
  if (!active) return;
  const { stream, bar } = active;
  active = undefined;
  try {
    bar.stop();
  } finally {
    stream.write(`\r\u001b[2K${RESTORE_TERMINAL}`);
  }
}

export function progress(show: boolean, stream: NodeJS.WriteStream = process.stderr): Progress {
  if (!show || !stream.isTTY) return silent;
  const bar = new SingleBar({
    stream,
    format: '{stage} [{bar}] {percentage}%',
    hideCursor: true,
    clearOnComplete: true,
    linewrap: false,
    fps: 10,
  });
  let started = false;
  let current = '';
  return {
    update(stage, done, total) {
      const t = Math.max(1, Math.round(total));
      const d = Math.min(t, Math.max(0, Math.round(done)));
      if (!started) {
        bar.start(t, d, { stage });
        (bar as unknown as { render(force: boolean): void }).render(true);
        active = { stream, bar };
        started = true;
      } else if (stage !== current) {
        bar.setTotal(t);
        bar.update(d, { stage });
        (bar as unknown as { render(force: boolean): void }).render(true); // a new stage shows at once, not at the next frame
      } else {
        if (bar.getTotal() !== t) bar.setTotal(t);
        bar.update(d);
      }
      current = stage;
    },
    stop() {
      if (!started) return;
      started = false;
      if (active?.bar === bar) restoreTerminal();
      else bar.stop();
    },
  };
}
