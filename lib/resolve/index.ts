export * from "./types";
export {
  normaliseDoi,
  normaliseTitle,
  mainTitle,
  editionOf,
  firstAuthorSurname,
  surnameKey,
  normaliseYear,
  referenceKey,
  foldAscii,
} from "./normalise";
export { scorePair, titleSimilarity, type ReferenceLike } from "./score";
export { resolveReference, TITLE_MATCH_THRESHOLD } from "./resolve";
