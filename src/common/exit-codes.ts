/** Exit codes, the same for the command line and the action. */
export const EXIT = {
  /** pass, improved or new. */
  ok: 0,
  /** fail or inconclusive: the gate says no. */
  gate: 1,
  /** Bad input or usage: a message names the file, line and column or key; nothing was written. */
  badInput: 2,
  /** A bug in neuron-budget (never for anything a user can put in a file). */
  internal: 3,
} as const;

export type ExitCode = (typeof EXIT)[keyof typeof EXIT];
