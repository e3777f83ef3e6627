// Words that carry no meaning for matching a sheet; dropped from the free text.
const STOP_WORDS = new Set(["a", "an", "and", "at", "by", "for", "in", "into", "of", "on", "or", "the", "to", "with", "using"]);

export const isStopWord = (word: string) => STOP_WORDS.has(word);
