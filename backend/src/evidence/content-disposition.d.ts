// Types for the content-disposition package, used by a spec as an independent parser.
declare module 'content-disposition' {
  interface Parsed {
    type: string;
    parameters: Record<string, string>;
  }
  const contentDisposition: { parse(header: string): Parsed };
  export default contentDisposition;
}
