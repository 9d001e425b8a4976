/** `portwright check FILE`: reads a section file, checks every variant's geometry and prints a short summary. */

import type { PortDocument, Variant } from '../document/types.ts';
import { EXIT_OK, EXIT_USER_ERROR, type CliIO, type Command } from './command.ts';
import { UserError } from './errors.ts';
import { readSectionFile } from './read-file.ts';
import { summariseVariant, type SectionSummary } from './section-summary.ts';

export const checkCommand: Command = {
  name: 'check',
  args: 'FILE',
  summary: 'check a section file and summarise each variant: edges, islands, walls, fluid area',
  run: (args, io) => {
    if (args.length !== 1) throw new UserError(`check takes one file (got ${args.length} arguments); usage: portwright check FILE`);
    return checkFile(args[0], io);
  },
};

function checkFile(path: string, io: CliIO): number {
  const { document, fileVersion } = readSectionFile(path);
  io.out(document.title);
  io.out(`  file: ${path} (format version ${fileVersion}${fileVersion < document.version ? `, upgraded to ${document.version} on reading` : ''})`);
  io.out(`  units: ${document.units}`);
  io.out(`  variants: ${document.variants.length}, active: "${document.activeVariant}"`);
  const broken: string[] = [];
  for (const variant of document.variants) {
    const summary = summariseVariant(variant, document);
    printVariant(variant, summary, document, io);
    if (summary.problems.length > 0) broken.push(variant.name);
  }
  if (broken.length === 0) {
    io.out(`OK: ${plural(document.variants.length, 'variant')} checked, no problems`);
    return EXIT_OK;
  }
  io.err(`portwright check: ${path}: ${broken.length} of ${plural(document.variants.length, 'variant')} cannot be solved: ${broken.map((n) => `"${n}"`).join(', ')} (problems listed above)`);
  return EXIT_USER_ERROR;
}

function printVariant(variant: Variant, s: SectionSummary, doc: PortDocument, io: CliIO): void {
  io.out('');
  io.out(`variant "${variant.name}"${variant.name === doc.activeVariant ? ' (active)' : ''}`);
  const walls = s.outlineEdges - s.inletEdges - s.outletEdges;
  io.out(`  edges: ${s.outlineEdges} in the outline (${s.inletEdges} inlet, ${s.outletEdges} outlet, ${walls} wall), ${s.islandEdges} in islands`);
  io.out(`  islands: ${s.islandNames.length}${s.islandNames.length > 0 ? ` (${s.islandNames.join(', ')})` : ''}`);
  if (s.wallNames.length > 0) io.out(`  walls: ${s.wallNames.join(', ')}`);
  if (s.fluidArea !== undefined) io.out(`  fluid area: ${formatArea(s.fluidArea, doc.units)} ${doc.units}^2 (outline minus islands)`);
  for (const problem of s.problems) io.out(`  problem: ${problem}`);
}

/** mm^2 to 0.1, inch^2 to 0.0001: both finer than a tracing is accurate. */
function formatArea(area: number, units: PortDocument['units']): string {
  return area.toFixed(units === 'mm' ? 1 : 4);
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}
