/**
 * The Fernhill Works demo: the fictional scenario, its seeded year, and the three workbook layouts
 * the `fluxbook demo` command writes and recalculates.
 */
export * from './bids';
export * from './fleet';
export * from './generators';
export * from './scenario';
export * from './year';
