/**
 * QuakeML 1.2 event types kept as earthquakes: "earthquake", "induced or triggered event"
 * (it shakes the same ground) and "not reported"; an absent type, or one written "null", is kept too. Explosions,
 * quarry blasts, "not existing" and the rest are rejected so they do not enter recurrence fits.
 */
// "null" is how some services write a type that was never given (common practice): it says
// nothing about the event, as an absent type does not.
const KEPT = new Set(['', 'null', 'earthquake', 'induced or triggered event', 'not reported']);

export const acceptedEventType = (type: string): boolean => KEPT.has(type.trim().toLowerCase());
