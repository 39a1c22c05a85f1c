// The plan's noise-path parts: what is put into segments by hand, and a fan's spectrum read from a CSV.
export { pathInsertSchema, plenumBoxSchema, MAX_INSERT_LOSS_DB } from './insert-schema';
export { parseFanSpectrumCsv, type FanSpectrumCsvResult } from './fan-spectrum-csv';
