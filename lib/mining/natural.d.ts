// natural ships no types for its deep module paths; only the sentence tokenizer is used.
declare module "natural/lib/natural/tokenizers/sentence_tokenizer.js" {
  export default class SentenceTokenizer {
    constructor(abbreviations?: string[], trimSentences?: boolean);
    tokenize(text: string): string[];
  }
}
