// convert-units 2.x ships no types; tests use it only as an independent check.
declare module "convert-units" {
  interface Converter {
    from(unit: string): Converter;
    to(unit: string): number;
  }
  const convert: (value?: number) => Converter;
  export default convert;
}
