/**
 * A request body as a form sends it: every number field may carry the text as typed, or null when left
 * empty, so that the server (not the form) refuses it and names the field. Built from the generated DTO,
 * so field names and enumerations stay those of the API.
 */
export type AsTyped<T> = T extends number
  ? T | string | null
  : T extends readonly (infer U)[]
    ? AsTyped<U>[]
    : T extends object
      ? { [K in keyof T]: AsTyped<T[K]> }
      : T;
