// The few members of the RS-274 reader (npm gcode-parser, MIT) that the program tests use.
declare module 'gcode-parser' {
  export interface ParsedLine {
    line: string;
    words: [string, number][];
    comments?: string[];
    cmds?: string[];
  }
  export function parseStringSync(text: string): ParsedLine[];
  const parser: { parseStringSync: typeof parseStringSync };
  export default parser;
}
