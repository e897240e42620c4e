// Minimal types for the parts of js-quantities the unit tests use as a reference (tests only).
declare module 'js-quantities' {
  interface Quantity {
    to(unit: string): Quantity;
    scalar: number;
  }
  function Qty(text: string): Quantity;
  export default Qty;
}
