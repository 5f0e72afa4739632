/**
 * gateKind: the key under which a gate is counted — its name with its modifiers written the
 * OpenQASM way (e.g. "ctrl(2) @ x", "negctrl @ cx", "inv @ s", "pow(0.5) @ x"); `inv @` is left out
 * for a self-inverse gate raised to an integer power.
 */
import { standardGate } from './standardGates.js';

function controlPrefix(keyword: string, count: number): string {
  if (count === 0) return '';
  return count === 1 ? `${keyword} @ ` : `${keyword}(${count}) @ `;
}

export function gateKind(name: string, controls: number, negControls: number, inverse: boolean, power: number): string {
  const selfInverse = standardGate(name)?.selfInverse === true && Number.isInteger(power);
  return (
    controlPrefix('ctrl', controls) +
    controlPrefix('negctrl', negControls) +
    (inverse && !selfInverse ? 'inv @ ' : '') +
    (power !== 1 ? `pow(${power}) @ ` : '') +
    name
  );
}
