// Public API of the engineering arithmetic shared by the app and the server.
export * from '@/shared/calc/units';
export * from '@/shared/calc/water';
export * from '@/shared/calc/glycol';
export * from '@/shared/calc/check-result';
export * from '@/shared/calc/check-bands';
export * from '@/shared/calc/heating-checks';
export * from '@/shared/calc/pressure-checks';
export * from '@/shared/calc/sealed-system';
export * from '@/shared/calc/gas-checks';
export * from '@/shared/calc/hot-water';
export * from '@/shared/calc/water-treatment';
export * from '@/shared/calc/compensation';
export * from '@/shared/calc/reading-checks';
export * from '@/shared/calc/expansion-vessel-rules';
export * from '@/shared/calc/expansion-vessel';
export * from '@/shared/calc/schemas';
