/**
 * QuakeML 1.2 event types kept as earthquakes: "earthquake", "induced or triggered event"
 * (it shakes the same ground) and "not reported"; an absent type is kept too. Explosions,
 * quarry blasts, "not existing" and the rest are rejected so they do not enter recurrence fits.
 */
const KEPT = new Set(['', 'earthquake', 'induced or triggered event', 'not reported']);

export const acceptedEventType = (type: string): boolean => KEPT.has(type.trim().toLowerCase());
