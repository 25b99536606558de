/**
 * Five-point Gauss–Lobatto rule on [0, 1]: both ends are nodes, so a chain of panels shares them, and
 * it is exact for polynomials of degree 7. On [−1, 1] the nodes are ±1 and the roots of P₄′ (0, ±√(3/7))
 * and the weights 2 / (n(n − 1)·P₄(x)²): 1/10, 49/90, 32/45 (Abramowitz & Stegun §25.4, Lobatto integration).
 */
const HALF_GAP = Math.sqrt(3 / 7) / 2;
export const GAUSS_LOBATTO_5 = {
  nodes: [0, 0.5 - HALF_GAP, 0.5, 0.5 + HALF_GAP, 1],
  weights: [1 / 20, 49 / 180, 16 / 45, 49 / 180, 1 / 20],
} as const;
