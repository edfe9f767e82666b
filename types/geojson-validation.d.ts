// geojson-validation 1.0.2 ships no types (it is CommonJS); only the call we use is declared.
declare module "geojson-validation" {
  const gjv: {
    /** With trace = true, returns the list of problems (empty when valid). */
    valid(object: unknown, trace: true): string[];
  };
  export default gjv;
}
