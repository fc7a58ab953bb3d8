// The problems section validation and preparation report: data, never thrown, each with a
// message that names the horizon (if any) and says how to fix it.

export type SectionProblemCode = 'empty-section' | 'too-few-points' | 'not-finite' | 'pins-invalid' | 'misses-pin'
  | 'crosses-pin-twice' | 'self-intersecting' | 'duplicate-name' | 'bad-projected-run' | 'bad-units' | 'bad-shape'
  | 'not-on-fault' | 'unknown-fault' | 'too-large' | 'out-of-range';

/** One input problem; `message` names the horizon or fault (if any) and how to fix it. */
export interface SectionProblem { code: SectionProblemCode; horizon?: string; fault?: string; message: string }
