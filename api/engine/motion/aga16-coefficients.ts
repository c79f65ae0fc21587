/**
 * Coefficients of AGA16: Abrahamson, N., Gregor, N. & Addo, K. (2016), "BC Hydro ground motion
 * prediction equations for subduction earthquakes", Earthquake Spectra 32(1), 23–44,
 * doi:10.1193/051712EQS188MR.
 *
 * Source of the numbers: the paper's Table 3 (period-dependent coefficients: Vlin, b, θ1, θ2,
 * θ6, θ7, θ8, θ10–θ16; θ7, θ8, θ15, θ16 are the backarc terms, kept for the record: Tremora
 * takes every site as forearc), its period-independent constants (C1, θ3, θ4, θ5, θ9, C4, n,
 * c, φ, τ) and its ΔC1 table. Table 3 is kept in `aga16.json` beside this module, copied
 * unchanged from the project's reference record; the constants below are copied digit for digit
 * from the same record (`aga16.csv` and `aga16-constants.csv` of the shared GMM reference data; its README gives the
 * provenance: pygmm 0.8.0's data file "Coefficients from Table 3", cross-checked against three
 * other public records; θ15 at PGA and 0.02 s is 0.9969, where one record transposes digits).
 *
 * ΔC1 (the shift of the magnitude break): the central interface anchors are agreed by four
 * records. The lower and upper branches (central ∓ 0.2 at every anchor) rest on a single
 * public record, which the reference README marks as provisional until checked against the
 * paper's ΔC1 table; Tremora offers them as the AGA16-lower and AGA16-upper variants with that
 * caveat. Intraslab: −0.3 at every period, no branches.
 *
 * How the table is checked: test/engine/motion/aga16.vectors.test.ts compares the model (every
 * branch) with independent test vectors computed from the same published table to 1e-4.
 *
 * Units: ln Y is ln(g). θ1, θ10 in ln(g); θ2, θ14 multiply ln(R + C4 exp(θ9 (M − 6))), R in
 * km; θ6 per km of R; θ11 per km of hypocentral depth; θ12 and b multiply ln(Vs30 / Vlin) and
 * ln(PGA + c) (PGA in g); θ13 per magnitude unit squared; Vlin m/s; φ, τ natural-log units.
 */
import { readModelTable, type CoefficientRow, type ModelTable } from './coefficient-table.ts';
import PUBLISHED from './aga16.json' with { type: 'json' };

/** Column names of Table 3, in the paper's order. */
export const AGA16_COLUMNS = [
  'vlin',
  'b',
  'theta1',
  'theta2',
  'theta6',
  'theta7',
  'theta8',
  'theta10',
  'theta11',
  'theta12',
  'theta13',
  'theta14',
  'theta15',
  'theta16',
] as const;

/** One row of Table 3. `periodS` is 0 for the PGA row. */
export type Aga16Row = CoefficientRow<(typeof AGA16_COLUMNS)[number]>;

/** The table as the model reads it: every row, the PGA row, the spectral rows and their periods. */
export const AGA16_TABLE: ModelTable<Aga16Row> = readModelTable('AGA16', PUBLISHED, AGA16_COLUMNS);

/** Period-independent constants of the paper (aga16-constants.csv). */
export const AGA16_CONSTANTS = Object.freeze({
  /** Magnitude dependence of geometric spreading, per magnitude unit. */
  theta3: 0.1,
  /** Magnitude slope below the break, ln(g) per magnitude unit. */
  theta4: 0.9,
  /** Magnitude slope above the break, ln(g) per magnitude unit: zero, the paper's saturation. */
  theta5: 0,
  /** Growth of the finite-fault term with magnitude, per magnitude unit. */
  theta9: 0.4,
  /** Magnitude break before the ΔC1 shift. */
  c1: 7.8,
  /** Finite-fault distance scale, km. */
  c4Km: 10,
  /** Exponent of Vs30/Vlin in the nonlinear site term. */
  n: 1.18,
  /** Offset added to PGA (g) in the nonlinear site term. */
  c: 1.88,
  /** Within-event standard deviation, every period, ln units. */
  phi: 0.6,
  /** Between-event standard deviation, every period, ln units. */
  tau: 0.43,
  /** Vs30 at and above which the site term stops changing, m/s (the paper's Vs* = min(Vs30, 1000)). */
  vs30CapMS: 1000,
  /** Hypocentral depth at and below which the intraslab depth term stops growing, km. */
  depthCapKm: 120,
  /** Hypocentral depth at which the intraslab depth term is zero, km. */
  depthReferenceKm: 60,
});

/** The ΔC1 branches of interface events. */
export type Aga16DeltaC1Branch = 'lower' | 'central' | 'upper';

/**
 * ΔC1 anchors of interface events, (period s, ΔC1), per branch (aga16-constants.csv): PGA
 * (period 0) and periods up to the first anchor take its value, periods from the last anchor
 * take the last; between anchors ΔC1 is linear in ln(period), as three of the four records do.
 */
export const AGA16_DELTA_C1_INTERFACE: Readonly<
  Record<Aga16DeltaC1Branch, readonly (readonly [periodS: number, deltaC1: number])[]>
> = Object.freeze({
  central: [
    [0.3, 0.2],
    [0.5, 0.1],
    [1, 0],
    [2, -0.1],
    [3, -0.2],
  ],
  lower: [
    [0.3, 0],
    [0.5, -0.1],
    [1, -0.2],
    [2, -0.3],
    [3, -0.4],
  ],
  upper: [
    [0.3, 0.4],
    [0.5, 0.3],
    [1, 0.2],
    [2, 0.1],
    [3, 0],
  ],
});

/** ΔC1 of intraslab events at every period: the magnitude break sits at C1 − 0.3 = 7.5. */
export const AGA16_DELTA_C1_INTRASLAB = -0.3;
