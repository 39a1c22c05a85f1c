export { csvNumber, csvText, neutraliseCell, type CsvCell } from './csv-text';
export { csvFileName } from './file-name';
