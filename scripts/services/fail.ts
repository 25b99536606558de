// A set-up step that cannot go on: one sentence saying what happened and what to do.
export class StackError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "StackError";
  }
}
