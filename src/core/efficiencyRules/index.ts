/**
 * Efficiency regulations, in three parts: the US DOE tables (doe.ts), the EU Tier 2 tables
 * (eu.ts) and the check of a unit's losses against either (compliance.ts). The reference tests
 * re-read every row against the printed tables.
 */
export * from './compliance';
export * from './doe';
export * from './eu';
