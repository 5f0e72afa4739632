// generate-circuits: regenerates circuits/demo-point/ — the OpenQASM 3 Hadamard-test files, the block-encodings with
// their operator files, manifest.json and README.txt of the built-in demo's recorded point
// (src/cli/readout/demoScenario.ts), exactly as `polewright demo` writes them.
// Run: npx tsx scripts/generate-circuits.ts [DIR]   (default circuits/demo-point)
import { fileURLToPath } from 'node:url';
import { loadModelFile } from '../src/model/loadModelFile.js';
import { DEMO_MODEL_PATH, demoPointFiles } from '../src/cli/readout/demoScenario.js';
import { solvedGround } from '../src/cli/readout/solvedGround.js';
import { topLevelNames, writeFolderAtomic } from '../src/core/writeFolderAtomic.js';

const target = process.argv[2] ?? fileURLToPath(new URL('../circuits/demo-point', import.meta.url));
const model = loadModelFile(DEMO_MODEL_PATH);
const files = demoPointFiles(model, solvedGround(model));
writeFolderAtomic(target, files, { onlyReplace: topLevelNames(files) });
process.stdout.write(`wrote ${target}: ${[...files.keys()].join(', ')}\n`);
