// Types for the convert-units package (2.3.4 ships none); only the chain the cross-checks use.
declare module 'convert-units' {
  interface Conversion {
    from(unit: string): { to(unit: string): number };
  }
  export default function convert(value: number): Conversion;
}
