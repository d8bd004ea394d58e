/** Every text the archive stage shows a user, one function each. */

export const folderExists = () => 'period folder already exists; use --force to replace it';

export const badExportName = (name: string) => `invalid export file name: ${name}`;

export const unreadableResults = () => 'results.json missing or unreadable';
