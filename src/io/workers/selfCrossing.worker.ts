// Tests long lines for self-crossing off the main thread (sweepSelfCrossing). Protocol: { key, xs, zs } (transferred)
// answers { key, verdict } with the crossing segments or null.
import { sweepSelfCrossing } from '../../core/geometry/sweepSelfCrossing';

export interface SelfCrossingRequest { key: string; xs: Float64Array; zs: Float64Array }
export interface SelfCrossingReply { key: string; verdict: [number, number] | null }

self.onmessage = (e: MessageEvent<SelfCrossingRequest>) => {
  const { key, xs, zs } = e.data;
  const reply: SelfCrossingReply = { key, verdict: sweepSelfCrossing(xs, zs) };
  (self as unknown as { postMessage(m: unknown): void }).postMessage(reply);
};
