/** A one-line progress bar for long runs, redrawn in place on a terminal. */
export class ProgressBar {
  private readonly started = performance.now();
  private done = 0;

  constructor(
    private readonly total: number,
    private readonly stream: NodeJS.WriteStream,
    private readonly width = 30,
    /** What the count given to `tick` counts ("solved", "written", ...). */
    private readonly counted = 'solved',
  ) {}

  get enabled(): boolean {
    return this.stream.isTTY === true;
  }

  tick(solved: number): void {
    this.done++;
    if (!this.enabled) return;
    const filled = Math.round((this.done / Math.max(1, this.total)) * this.width);
    const elapsed = (performance.now() - this.started) / 1000;
    const remaining = this.done > 0 ? (elapsed / this.done) * (this.total - this.done) : 0;
    this.stream.write(
      `\r[${'='.repeat(filled)}${' '.repeat(this.width - filled)}] ${this.done}/${this.total} tasks, ${solved} ${this.counted}, ${formatDuration(elapsed)} elapsed, about ${formatDuration(remaining)} left `,
    );
  }

  finish(): void {
    if (this.enabled) this.stream.write('\n');
  }
}

export function formatDuration(seconds: number): string {
  if (seconds < 60) return `${seconds.toFixed(0)} s`;
  const minutes = Math.floor(seconds / 60);
  if (minutes < 60) return `${minutes} min ${Math.round(seconds - minutes * 60)} s`;
  return `${Math.floor(minutes / 60)} h ${minutes % 60} min`;
}
