/** sectorMemory: bytes needed to hold `vectors` vectors of a sector plus its diagonal, estimated up front. */
import { ensureFits } from '../../core/memoryBudget.js';

export function ensureSectorFits(dimension: number, vectors: number, complex: boolean, what: string, limit?: number): void {
  const bytes = dimension * 8 * (vectors * (complex ? 2 : 1) + 1) + (1 << 20);
  ensureFits(bytes, `${what} (dimension ${dimension}, ${vectors} vectors)`, limit);
}
