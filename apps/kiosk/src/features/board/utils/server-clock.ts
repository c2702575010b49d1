/**
 * How far the server's clock is ahead of this screen's (negative when behind), from an answer's
 * `generatedAt` and the moment, on this screen's clock, the answer arrived. TVs on a shop wall
 * often run a clock minutes off; elapsed times reckoned on the server's clock stay right.
 * The answer's travel time (milliseconds on a shop's network) is left in.
 */
export function serverClockOffset(generatedAt: string, receivedAt: number): number {
  const server = Date.parse(generatedAt);
  return Number.isNaN(server) || receivedAt <= 0 ? 0 : server - receivedAt;
}
