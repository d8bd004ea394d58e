import type {LanguageCode} from '../language.js';
import {en, type Catalog} from './en.js';
import {de} from './de.js';
import {fr} from './fr.js';

/** Every language's catalogue. Adding a language: a file typed `Catalog` and one entry here (see DEVELOPERS.md). */
export const catalogs: Record<LanguageCode, Catalog> = {en, de, fr};
