/** Full Fourier series for the centre of a slab whose surface is stepped (Bi → ∞) [C, standard result]. */
export function exactCentreRatioInfiniteBiot(fourier: number): number {
  let sum = 0;
  for (let n = 0; n < 200; n += 1) {
    const lambda = ((2 * n + 1) * Math.PI) / 2;
    sum += ((4 / Math.PI) * (n % 2 === 0 ? 1 : -1)) / (2 * n + 1) * Math.exp(-lambda * lambda * fourier);
  }
  return sum;
}
