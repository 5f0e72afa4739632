/**
 * mutateText: one format-blind mutation of a file's text — truncation, byte flips, a line duplicated or deleted,
 * or two files spliced together at random line boundaries.
 */
import type { FuzzRandom } from './fuzzRandom.js';
import type { Mutation } from './mutateJson.js';

export function mutateText(random: FuzzRandom, text: string, donor: string): Mutation {
  const lines = text.split('\n');
  switch (random.int(5)) {
    case 0: {
      const at = random.int(text.length + 1);
      return { text: text.slice(0, at), name: `truncate at ${at}` };
    }
    case 1: {
      let flipped = text;
      const flips = 1 + random.int(4);
      for (let k = 0; k < flips && flipped.length > 0; k++) {
        const at = random.int(flipped.length);
        flipped = flipped.slice(0, at) + String.fromCharCode(random.pick([0, 9, 10, 34, 39, 44, 45, 46, 59, 91, 93, 123, 125, 0xfeff, 0xd800, 0x3b1, random.int(128)])) + flipped.slice(at + 1);
      }
      return { text: flipped, name: `${flips} byte flips` };
    }
    case 2: {
      const at = random.int(lines.length);
      // At most about 4 MB of repeated text, however long the line has become.
      const copies = Math.min(random.pick([1, 2, 100, 5000]), Math.floor(4e6 / (lines[at]!.length + 1)) + 1);
      lines.splice(at, 0, ...new Array<string>(copies).fill(lines[at]!));
      return { text: lines.join('\n'), name: `line ${at + 1} repeated ${copies} times` };
    }
    case 3: {
      const at = random.int(lines.length);
      lines.splice(at, 1);
      return { text: lines.join('\n'), name: `line ${at + 1} deleted` };
    }
    default: {
      const donorLines = donor.split('\n');
      const head = lines.slice(0, random.int(lines.length + 1));
      const tail = donorLines.slice(random.int(donorLines.length + 1));
      return { text: [...head, ...tail].join('\n'), name: 'spliced with another seed' };
    }
  }
}
