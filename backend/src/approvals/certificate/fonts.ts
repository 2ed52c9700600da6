import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { woffToSfnt } from './woff-to-sfnt.js';

const require = createRequire(import.meta.url);

// Roboto from npm (@fontsource/roboto ships .woff per alphabet; pdfkit reads .woff, not .woff2).
const FILES = {
  regular: 'roboto-latin-400-normal.woff',
  medium: 'roboto-latin-500-normal.woff',
  bold: 'roboto-latin-700-normal.woff',
  italic: 'roboto-latin-400-italic.woff',
  math: 'roboto-math-400-normal.woff',
} as const;

export type FontName = keyof typeof FILES;

let cache: Record<FontName, Buffer> | null = null;

/** The font files, read and unpacked once; embedded as subsets so the PDF carries only the glyphs it uses. */
export function certificateFonts(): Record<FontName, Buffer> {
  cache ??= Object.fromEntries(
    Object.entries(FILES).map(([name, file]) => [
      name,
      woffToSfnt(readFileSync(require.resolve(`@fontsource/roboto/files/${file}`))),
    ]),
  ) as Record<FontName, Buffer>;
  return cache;
}

/**
 * Characters the Latin subset lacks but the math subset has (≤, ≥, Δ, √, ≈ …). The Latin
 * subset keeps the minus sign (U+2212) and the division slash (U+2215).
 */
export const needsMathFont = (ch: string) => {
  const cp = ch.codePointAt(0)!;
  return cp === 0x0394 || (cp >= 0x2200 && cp <= 0x22ff && cp !== 0x2212 && cp !== 0x2215);
};
