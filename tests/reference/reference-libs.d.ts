// Types for the reference libraries our checks use that ship none (only the parts we call).
declare module 'convert-units' {
  interface Converter {
    from(unit: string): { to(unit: string): number };
  }
  export default function convert(value: number): Converter;
}

declare module 'jsdom' {
  export class JSDOM {
    constructor(html?: string);
    window: Window & typeof globalThis;
  }
}
