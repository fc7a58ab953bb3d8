import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export interface StrdDataset {
  x: number[];
  y: number[];
  /** The first (comment) line, which carries NIST's certified values. */
  header: string;
}

/** Reads a NIST StRD CSV copied into tests/fixtures/nist-strd/. */
export function readStrd(fileName: string): StrdDataset {
  const path = fileURLToPath(new URL(`../../fixtures/nist-strd/${fileName}`, import.meta.url));
  const lines = readFileSync(path, 'utf8').split(/\r?\n/).filter((line) => line.trim() !== '');
  const header = lines[0];
  if (!header.startsWith('#') || lines[1] !== 'x,y') throw new Error(`${fileName}: unexpected layout`);
  const x: number[] = [];
  const y: number[] = [];
  for (const line of lines.slice(2)) {
    const [xs, ys] = line.split(',');
    x.push(Number(xs));
    y.push(Number(ys));
  }
  return { x, y, header };
}

/** The number after `label =` (or `label`) in the header, e.g. certified(h, 'B1'), certified(h, 'residual SS'). */
export function certified(header: string, label: string): number {
  const escaped = label.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const match = new RegExp(`${escaped}(?: =)? ([-+]?[0-9.]+(?:[Ee][-+]?[0-9]+)?)`).exec(header);
  if (!match) throw new Error(`no certified value "${label}" in header`);
  return Number(match[1]);
}

/** The standard deviation given in parentheses after `label = value`. */
export function certifiedSD(header: string, label: string): number {
  const escaped = label.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const match = new RegExp(`${escaped} = [-+]?[0-9.Ee+-]+ \\(SD ([-+]?[0-9.]+(?:[Ee][-+]?[0-9]+)?)\\)`).exec(header);
  if (!match) throw new Error(`no certified SD for "${label}" in header`);
  return Number(match[1]);
}
