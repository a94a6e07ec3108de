/**
 * A complex number as a plain object, the shape every computation module returns ({@link Complex}).
 * Hot loops in lib/porous work on `re`/`im` locals instead of these helpers to avoid allocation.
 */
export interface Complex {
  re: number;
  im: number;
}

/**
 * Builds a complex number.
 * @example complex(1, -2) // { re: 1, im: -2 }
 */
export function complex(re: number, im = 0): Complex {
  return { re, im };
}

/**
 * Product a·b.
 * @example multiply(complex(0, 1), complex(0, 1)) // { re: -1, im: 0 }
 */
export function multiply(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

/**
 * Quotient a/b (Smith's algorithm, which avoids needless overflow).
 * @example divide(complex(1, 0), complex(0, 1)) // { re: 0, im: -1 }
 */
export function divide(a: Complex, b: Complex): Complex {
  // Smith (1962), Comm. ACM 5:435
  if (Math.abs(b.re) >= Math.abs(b.im)) {
    const r = b.im / b.re;
    const d = b.re + b.im * r;
    return { re: (a.re + a.im * r) / d, im: (a.im - a.re * r) / d };
  }
  const r = b.re / b.im;
  const d = b.re * r + b.im;
  return { re: (a.re * r + a.im) / d, im: (a.im * r - a.re) / d };
}

/**
 * Modulus |a|.
 * @example abs(complex(3, 4)) // 5
 */
export function abs(a: Complex): number {
  return Math.hypot(a.re, a.im);
}
