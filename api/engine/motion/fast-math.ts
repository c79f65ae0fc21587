/**
 * √(a² + b²) without Math.hypot's guard against overflow, for the fast path's inner loops:
 * on Node 20 Math.hypot costs about 70 ns against 4 ns for this (measured on the project's
 * machine). The operands are distances in km and standard deviations, far from the range where
 * a² overflows; the result differs from Math.hypot's by at most an ulp or two.
 */
export const hypot2 = (a: number, b: number): number => Math.sqrt(a * a + b * b);
