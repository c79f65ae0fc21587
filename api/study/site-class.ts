import type { SiteClass } from '../engine/model.ts';

/**
 * Representative Vs30 (m/s) for each site class letter.
 *
 * Class bounds: ASCE 7-16, Minimum Design Loads and Associated Criteria for Buildings and Other
 * Structures, Table 20.3-1 (Site Classification), by average shear-wave velocity v̄s of the top
 * 100 ft (30 m): A > 5,000 ft/s (1,524 m/s); B 2,500–5,000 ft/s (762–1,524 m/s); C 1,200–2,500
 * ft/s (366–762 m/s); D 600–1,200 ft/s (183–366 m/s); E < 600 ft/s (183 m/s). (From memory of the
 * table; F, which needs a site-specific study, has no representative value and is not accepted.)
 *
 * Representative value of a bounded class: the geometric mean of its bounds, since ground-motion
 * site terms are linear in ln(Vs30) and the geometric mean is the class's centre on that scale
 * (B: √(762·1524) ≈ 1078 → 1080; C: √(366·762) ≈ 528 → 530; D: √(183·366) ≈ 259 → 260).
 * The intermediate letters BC, CD and DE name a site on a class boundary, so they take the
 * boundary value (762 → 760, 366 → 365, 183 → 185). The open-ended classes take the edge of the
 * usual ground-motion model range: A 1,500 m/s (upper limit of Boore et al. 2014) and E 150 m/s
 * (its lower limit), so that neither pushes a model outside its validity.
 */
export const SITE_CLASS_VS30: Readonly<Record<SiteClass, number>> = {
  A: 1500,
  B: 1080,
  BC: 760,
  C: 530,
  CD: 365,
  D: 260,
  DE: 185,
  E: 150,
};

export const SITE_CLASSES = Object.keys(SITE_CLASS_VS30) as readonly SiteClass[];
