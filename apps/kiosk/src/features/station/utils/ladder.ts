/** The least a rung needs to be placed on the ladder. */
export interface LadderRung {
  rule: number;
  passed: boolean;
}

/**
 * screens.md: the rule ladder shows every rule, the failing rungs first, each group in rule
 * order. The server sends them so already; the station orders them again so that the screen
 * holds to the design whatever order arrives.
 */
export function orderRungs<R extends LadderRung>(rungs: readonly R[]): R[] {
  return [...rungs].sort((a, b) => Number(a.passed) - Number(b.passed) || a.rule - b.rule);
}
