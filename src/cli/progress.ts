/**
 * A progress bar on stderr for big workbooks (cli-progress); nothing at all when stderr is not a
 * terminal (a pipe, a log file, CI), so output stays clean.
 */
import { SingleBar } from 'cli-progress';

/** Workbooks this big take long enough to be worth a bar. */
export const BAR_FORMULA_CELLS = 50_000;
/** A profile longer than a year of hours. */
export const BAR_PROFILE_STEPS = 8_760;

export interface Progress {
  stage(name: string, total: number): void;
  tick(): void;
  stop(): void;
}

const silent: Progress = { stage() {}, tick() {}, stop() {} };

export function wantsBar(formulaCells: number, longestRange: number): boolean {
  return formulaCells > BAR_FORMULA_CELLS || longestRange > BAR_PROFILE_STEPS;
}

export function progress(show: boolean, stream: NodeJS.WriteStream = process.stderr): Progress {
  if (!show || !stream.isTTY) return silent;
  const bar = new SingleBar({
    stream,
    format: '{stage} [{bar}] {percentage}% | {value}/{total}',
    hideCursor: true,
    clearOnComplete: true,
    etaBuffer: 50,
  });
  let started = false;
  let value = 0;
  let total = 1;
  // Updating the bar on every cell would cost more than the cell; every 1/200th is enough.
  let step = 1;
  return {
    stage(name, n) {
      value = 0;
      total = Math.max(1, n);
      step = Math.max(1, Math.floor(total / 200));
      if (!started) {
        bar.start(total, 0, { stage: name });
        started = true;
      } else {
        bar.setTotal(total);
        bar.update(0, { stage: name });
      }
    },
    tick() {
      if (value < total) value++;
      if (value % step === 0 || value === total) bar.update(value);
    },
    stop() {
      if (started) bar.stop();
    },
  };
}
