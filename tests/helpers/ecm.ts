/** The equivalent-circuit log generator, for tests: synthetic logs with known truth. */
export {
  EcmSimulator,
  csvChunks,
  generateLog,
  ocvPerCellV,
  seededRandom,
  toCsv,
  type CsvColumn,
  type CsvDialect,
  type EcmOptions,
} from "@/lib/synthetic/equivalent-circuit";
export { clock, decimate } from "./logs";
