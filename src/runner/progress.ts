import type { Phase, Progress } from "./recalc";

/**
 * A one-line progress bar for long recalculations, drawn only on a terminal and only once a run
 * has taken longer than `delayMs`, so short runs and piped output stay quiet.
 */
export interface ProgressBar {
  readonly update: Progress;
  /** Clears the bar's line (if one was drawn). */
  done(): void;
}

interface Terminal {
  isTTY?: boolean;
  columns?: number;
  write(s: string): unknown;
}

const LABEL: Record<Phase, string> = { reading: "reading", calculating: "calculating", writing: "writing" };

export function progressBar(stream: Terminal, delayMs = 400): ProgressBar {
  if (!stream.isTTY) return { update: () => undefined, done: () => undefined };
  const started = Date.now();
  let drawn = false;
  let last = 0;
  return {
    update(phase, done, total) {
      const now = Date.now();
      if (now - started < delayMs || (now - last < 80 && done < total)) return;
      last = now;
      const width = Math.max(10, Math.min(40, (stream.columns ?? 80) - 40));
      const frac = total > 0 ? Math.min(1, done / total) : 0;
      const full = Math.round(frac * width);
      const count = phase === "calculating" && total > 1 ? `  ${done.toLocaleString("en-US")}/${total.toLocaleString("en-US")} ORBIT calls` : "";
      stream.write(`\r${LABEL[phase].padEnd(11)} [${"#".repeat(full)}${"-".repeat(width - full)}] ${String(Math.round(frac * 100)).padStart(3)}%${count}\x1b[K`);
      drawn = true;
    },
    done() {
      if (drawn) stream.write("\r\x1b[K");
      drawn = false;
    },
  };
}
