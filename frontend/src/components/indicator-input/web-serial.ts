/** The small part of the Web Serial API used here (not yet in TypeScript's DOM library). */
export interface SerialPortLike {
  open(options: { baudRate: number }): Promise<void>;
  close(): Promise<void>;
  readable: ReadableStream<Uint8Array> | null;
}

export interface SerialLike {
  requestPort(): Promise<SerialPortLike>;
}

export const webSerial = (): SerialLike | null =>
  typeof navigator !== 'undefined' && 'serial' in navigator
    ? ((navigator as { serial?: SerialLike }).serial ?? null)
    : null;

export type LineEnding = 'cr' | 'lf' | 'crlf';
export const LINE_ENDINGS: Record<LineEnding, { label: string; text: string }> = {
  cr: { label: 'CR', text: '\r' },
  lf: { label: 'LF', text: '\n' },
  crlf: { label: 'CR LF', text: '\r\n' },
};

export const BAUD_RATES = [1200, 2400, 4800, 9600, 19200, 38400, 57600, 115200];

/**
 * Cuts a stream of text into lines at the chosen ending. Stray CR or LF left by a near-miss
 * setting (LF chosen, CR LF sent) are trimmed off by the parser, so the lines still read.
 */
export class LineSplitter {
  private rest = '';
  constructor(private readonly ending: LineEnding) {}

  push(chunk: string): string[] {
    const parts = (this.rest + chunk).split(LINE_ENDINGS[this.ending].text);
    this.rest = parts.pop() ?? '';
    return parts.filter((p) => p.trim() !== '');
  }
}
