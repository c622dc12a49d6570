// The one error a score file can be refused with: its message tells the director what to do. Pure.

/** A score that cannot be read or used as it is; the message is shown to the person who sent it. */
export class ScoreError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "ScoreError";
  }
}
