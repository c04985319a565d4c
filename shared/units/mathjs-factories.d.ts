/**
 * mathjs exports each factory at run time (`createUnitClass`, `createPow`, ...) but its type
 * declarations list only the bundled dependency objects. These are the factories convert.ts
 * builds its instance from; `mathjs/number` shares the declarations file of `mathjs`, so one
 * augmentation covers both entries.
 */
import type { FactoryFunctionMap } from 'mathjs';

type Factory = FactoryFunctionMap[string];

declare module 'mathjs' {
  export const createUnitClass: Factory;
  export const createUnitFunction: Factory;
  export const createCreateUnit: Factory;
  export const createBigNumberClass: Factory;
  export const createComplexClass: Factory;
  export const createFractionClass: Factory;
  export const createTyped: Factory;
  export const createAbs: Factory;
  export const createAddScalar: Factory;
  export const createCeil: Factory;
  export const createDivideScalar: Factory;
  export const createEqual: Factory;
  export const createEqualScalar: Factory;
  export const createFix: Factory;
  export const createFloor: Factory;
  export const createFormat: Factory;
  export const createIsNumeric: Factory;
  export const createMultiplyScalar: Factory;
  export const createNumber: Factory;
  export const createPow: Factory;
  export const createRound: Factory;
  export const createSubtractScalar: Factory;
}
