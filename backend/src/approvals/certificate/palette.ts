// The product's own colours (frontend theme), so the certificate reads like the board.
export const INK = '#1e2624';
export const MUTED = '#4d5855';
export const RULE = '#d9d4c7';
export const STEEL = '#1d4f4a';
export const BRASS = '#c8932a';
export const PAPER = '#f6f4ef';
/** Warning text: a dark brass that reads as caution without looking like a failed check. */
export const WARNING_INK = '#7a5312';
export const STATUS_COLOURS: Record<string, string> = {
  'within-target': '#2e7d4f',
  'outside-target': '#b3261e',
  waived: '#7a5aa6',
  'not-started': '#6b7572',
};
