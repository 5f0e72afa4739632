/**
 * distinctColors: `count` pairwise different colours as #rrggbb. Up to ten, the Tableau 10 palette
 * (the category scheme vega uses by default); beyond, hues evenly spaced around the colour wheel at
 * fixed saturation and lightness, so no two are equal however many are asked for.
 */
const TABLEAU10 = ['#4c78a8', '#f58518', '#e45756', '#72b7b2', '#54a24b', '#eeca3b', '#b279a2', '#ff9da6', '#9d755d', '#bab0ac'];

export function distinctColors(count: number): string[] {
  if (count <= TABLEAU10.length) return TABLEAU10.slice(0, count);
  const colours: string[] = [];
  for (let k = 0; k < count; k++) colours.push(hslToHex((360 * k) / count, 0.65, 0.45));
  return colours;
}

/** HSL (h in degrees, s and l in [0, 1]) to #rrggbb (the CSS Color 3 conversion). */
function hslToHex(h: number, s: number, l: number): string {
  const a = s * Math.min(l, 1 - l);
  const channel = (n: number): string => {
    const k = (n + h / 30) % 12;
    const value = l - a * Math.max(-1, Math.min(k - 3, 9 - k, 1));
    return Math.round(255 * value).toString(16).padStart(2, '0');
  };
  return `#${channel(0)}${channel(8)}${channel(4)}`;
}
