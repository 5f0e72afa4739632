// formatComplex: a short human form of a complex number for error messages.
export function formatComplex(re: number, im: number): string {
  if (im === 0) return `${re}`;
  if (re === 0) return `${im}i`;
  return im < 0 ? `${re}-${-im}i` : `${re}+${im}i`;
}
