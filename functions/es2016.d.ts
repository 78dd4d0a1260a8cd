/**
 * Declarations, for the ES2016 type check of the functions entry (tsconfig.functions.json), of
 * exactly the newer built-ins that functions/es2016.ts supplies. Nothing else may be added here
 * without adding its implementation there.
 */
interface Array<T> {
  flatMap<U, This = undefined>(callback: (this: This, value: T, index: number, array: T[]) => U | ReadonlyArray<U>, thisArg?: This): U[];
}
interface ObjectConstructor {
  entries<T>(o: { [s: string]: T } | ArrayLike<T>): [string, T][];
  entries(o: object): [string, any][];
  values<T>(o: { [s: string]: T } | ArrayLike<T>): T[];
  values(o: object): any[];
}
interface String {
  trimStart(): string;
}
