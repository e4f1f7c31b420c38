export type { Quantity } from './quantity.ts';
export { quantities } from './quantity.ts';
export { parseQuantity, type ParsedQuantity } from './si.ts';
export { formatSI } from './format.ts';
