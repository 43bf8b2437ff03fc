export { parsePeakList } from './parse-peak-list';
