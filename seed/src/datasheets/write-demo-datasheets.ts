/**
 * Writes the three demo datasheets and their truth.json into a folder:
 *   npx tsx seed/src/datasheets/write-demo-datasheets.ts <dir>
 */
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { buildDemoDatasheets } from './demo-datasheets';
import { renderDatasheet } from './render-datasheet';

const dir = process.argv[2];
if (!dir) {
  console.error('Usage: write-demo-datasheets.ts <output folder>');
  process.exit(2);
}
await mkdir(dir, { recursive: true });
const demos = buildDemoDatasheets();
for (const demo of demos) {
  const file = path.join(dir, demo.fileName);
  await writeFile(file, await renderDatasheet(demo.spec));
  console.log(`${file}  (${demo.manufacturer} ${demo.partNumber})`);
}
const truth = Object.fromEntries(demos.map((d) => [d.fileName, { truth: d.truth, revisedFromCatalog: d.revisedFromCatalog }]));
await writeFile(path.join(dir, 'truth.json'), `${JSON.stringify(truth, null, 2)}\n`);
