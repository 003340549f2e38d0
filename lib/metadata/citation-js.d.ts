// The part of @citation-js/core's API we use (the package ships no type declarations).
declare module "@citation-js/core" {
  export class Cite {
    static async(data: string): Promise<Cite>;
    data: unknown[];
  }
  export const plugins: {
    input: { chain(data: string, options: { target: string }): unknown };
  };
}
declare module "@citation-js/plugin-bibtex";
declare module "@citation-js/plugin-ris";
