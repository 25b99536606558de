/**
 * Gauss–Legendre nodes and weights on [0, 1], found by Newton's method on the Legendre polynomial
 * (Press et al., Numerical Recipes, 3rd ed., §4.6, routine gauleg). Exact for polynomials of degree 2n − 1.
 */
export function gaussLegendre(n: number): { nodes: number[]; weights: number[] } {
  const nodes: number[] = [];
  const weights: number[] = [];
  for (let i = 0; i < n; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let derivative = 1;
    for (let iteration = 0; iteration < 100; iteration++) {
      // Recurrence (j+1)P_{j+1} = (2j+1) z P_j − j P_{j−1}
      let p1 = 1;
      let p2 = 0;
      for (let j = 0; j < n; j++) {
        const p3 = p2;
        p2 = p1;
        p1 = ((2 * j + 1) * z * p2 - j * p3) / (j + 1);
      }
      derivative = (n * (z * p1 - p2)) / (z * z - 1);
      const step = p1 / derivative;
      z -= step;
      if (Math.abs(step) < 1e-15) break;
    }
    nodes.push((1 - z) / 2);
    weights.push(1 / ((1 - z * z) * derivative * derivative));
  }
  return { nodes, weights };
}
