/**
 * A plain mixed-radix fast Fourier transform for the tests' numerical cross-check (not a test file).
 * X[k] = Σ_n x[n]·e^{−j2πkn/N}; N may be any whole number (prime factors fall back to a direct sum).
 */
export interface Complex {
  re: number;
  im: number;
}

const smallestFactor = (n: number): number => {
  for (let f = 2; f * f <= n; f++) if (n % f === 0) return f;
  return n;
};

export function fft(x: readonly Complex[]): Complex[] {
  const n = x.length;
  if (n <= 1) return x.map((z) => ({ ...z }));
  const r = smallestFactor(n);
  if (r === n) {
    // Prime length: direct sum.
    return Array.from({ length: n }, (_, k) => {
      let re = 0;
      let im = 0;
      x.forEach((z, t) => {
        const a = (-2 * Math.PI * k * t) / n;
        re += z.re * Math.cos(a) - z.im * Math.sin(a);
        im += z.re * Math.sin(a) + z.im * Math.cos(a);
      });
      return { re, im };
    });
  }
  const m = n / r;
  // r decimated sub-sequences x[q], x[q + r], … each of length m.
  const subs = Array.from({ length: r }, (_, q) => fft(Array.from({ length: m }, (_, t) => x[q + t * r] ?? { re: 0, im: 0 })));
  return Array.from({ length: n }, (_, k) => {
    let re = 0;
    let im = 0;
    for (let q = 0; q < r; q++) {
      const y = subs[q]?.[k % m] ?? { re: 0, im: 0 };
      const a = (-2 * Math.PI * q * k) / n;
      re += y.re * Math.cos(a) - y.im * Math.sin(a);
      im += y.re * Math.sin(a) + y.im * Math.cos(a);
    }
    return { re, im };
  });
}
