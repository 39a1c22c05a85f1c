// Results the editor already holds, as CSV files a spreadsheet opens (written by lib/csv).
export { resonancesCsv, resonancesCsvHeader, fanToneWord } from './resonances-csv';
export { reflectionsCsv, reflectionsCsvHeader, reflectionBandsHz } from './reflections-csv';
export { endReflectionLossCsv, endReflectionLossCsvHeader } from './end-reflection-loss-csv';
export { listenerPathCsv, listenerPathCsvHeader } from './listener-path-csv';
export { reflectionPlace } from './reflection-place';
export { lengthColumn } from './length-column';
