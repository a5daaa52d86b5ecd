import { Logger } from '@nestjs/common';

/**
 * Runs `tick` every `intervalMs`, one run at a time (the next waits for the previous to end), until
 * `stop()`, which waits for a running tick. A failing tick is logged and the next one runs as planned.
 */
export class Poller {
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;
  private stopped = false;

  constructor(
    private readonly name: string,
    private readonly intervalMs: number,
    private readonly tick: () => Promise<unknown>,
    private readonly logger = new Logger(name),
  ) {}

  start(): void {
    this.stopped = false;
    this.schedule();
  }

  /** Runs a tick now unless one is running (then waits for that one). */
  async runNow(): Promise<void> {
    this.running ??= this.tick()
      .then(
        () => undefined,
        (error: unknown) => this.logger.error(`${this.name} failed: ${error instanceof Error ? error.message : String(error)}`),
      )
      .finally(() => {
        this.running = null;
      });
    await this.running;
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    await this.running;
  }

  private schedule(): void {
    if (this.stopped) return;
    this.timer = setTimeout(() => {
      void this.runNow().finally(() => this.schedule());
    }, this.intervalMs);
    this.timer.unref();
  }
}
