/**
 * Runs `fire` once `quietMs` have passed without a `poke`. A burst of pokes (one per keystroke)
 * costs one timer that re-arms itself, not a clearTimeout and a setTimeout per keystroke.
 *
 * @example
 * const later = new QuietTimer(400, () => recheck());
 * editor.on("update", () => later.poke()); // recheck() runs 400 ms after the last edit
 */
export class QuietTimer {
  private last = 0;
  private timer: ReturnType<typeof setTimeout> | null = null;

  constructor(
    private readonly quietMs: number,
    private readonly fire: () => void,
  ) {}

  poke(): void {
    this.last = Date.now();
    if (this.timer === null) this.arm(this.quietMs);
  }

  /** True while a poke is waiting for its quiet period. */
  get waiting(): boolean {
    return this.timer !== null;
  }

  cancel(): void {
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
  }

  private arm(ms: number): void {
    this.timer = setTimeout(() => {
      const left = this.last + this.quietMs - Date.now();
      if (left > 0) {
        this.arm(left);
        return;
      }
      this.timer = null;
      this.fire();
    }, ms);
  }
}
