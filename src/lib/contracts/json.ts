/**
 * A value as it arrives over JSON: dates become ISO strings, everything else keeps its shape. The
 * contracts describe what services return; islands read `Json<Contract>`.
 */
export type Json<T> = T extends Date
  ? string
  : T extends readonly (infer U)[]
    ? Json<U>[]
    : T extends object
      ? { [K in keyof T]: Json<T[K]> }
      : T;
