/**
 * Run by scripts/build.mjs before it bundles anything: the shipped material rows
 * must pass their schema and come out of it unchanged (the bundle then uses them
 * as written, see src/core/materials/index.ts), and every shipped demo preset must
 * parse. Prints what is wrong and exits 1 otherwise.
 */
import {isDeepStrictEqual} from 'node:util';
import {SHIPPED_ROWS, validateMaterialData} from '../../src/core/materials/index.js';
import {shippedProblems} from '../../src/store/shipped.js';

const problems: string[] = [];
try {
  const checked = validateMaterialData(SHIPPED_ROWS);
  if (!isDeepStrictEqual(checked, SHIPPED_ROWS)) problems.push('the material schema changes the shipped rows (a default or a transform): the bundle could not use them as written');
} catch (e) {
  problems.push(e instanceof Error ? e.message : String(e));
}
problems.push(...shippedProblems());
if (problems.length) {
  process.stderr.write(`build: shipped data is not valid:\n${problems.join('\n')}\n`);
  process.exit(1);
}
