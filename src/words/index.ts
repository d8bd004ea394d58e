export {wordsFor, type Words, type MessageValues} from './words.js';
export {languageOf, resolveLocale, LANGUAGES, type Language, type LanguageCode} from './language.js';
export type {MessageKey, Catalog} from './catalog/en.js';
export {wordNote, wordDataNote, type Note, type NoteCode, type QueryPlace} from './notes.js';
export {methodName, shortMethod} from './methodName.js';
export {phaseWords} from './phase.js';
