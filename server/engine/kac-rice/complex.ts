/** A complex number re + i·im (immutable value). */
export interface Complex {
  readonly re: number;
  readonly im: number;
}

/** Complex helpers for the exact real-eigenvalue density formula (analytic continuation). */
export const cx = {
  of: (re: number, im = 0): Complex => ({ re, im }),
  add: (a: Complex, b: Complex): Complex => ({ re: a.re + b.re, im: a.im + b.im }),
  sub: (a: Complex, b: Complex): Complex => ({ re: a.re - b.re, im: a.im - b.im }),
  mul: (a: Complex, b: Complex): Complex => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re }),
  scale: (a: Complex, s: number): Complex => ({ re: a.re * s, im: a.im * s }),
  /** e^a. */
  exp: (a: Complex): Complex => {
    const r = Math.exp(a.re);
    return { re: r * Math.cos(a.im), im: r * Math.sin(a.im) };
  },
  abs: (a: Complex): number => Math.hypot(a.re, a.im),
};
