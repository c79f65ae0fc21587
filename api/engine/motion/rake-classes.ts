import { wrapDeg180 } from '../units.ts';

/** A rupture's style of faulting as the NGA-West2 models class it. */
export type RakeClass = 'strike-slip' | 'normal' | 'reverse';

/**
 * The rake classes shared by ASK14 (Abrahamson, Silva & Kamai 2014) and CB14 (Campbell &
 * Bozorgnia 2014), rake in degrees, any turn: reverse for 30 < rake < 150, normal for
 * −150 < rake < −30 (both ends open), strike-slip otherwise (from memory of the papers). CY14
 * classes differently (closed ends, normal −120..−60) and keeps its own rule in cy14.ts.
 */
export function openRakeClass(rakeDeg: number): RakeClass {
  const rake = wrapDeg180(rakeDeg);
  if (rake > 30 && rake < 150) return 'reverse';
  if (rake > -150 && rake < -30) return 'normal';
  return 'strike-slip';
}
