/** Every text the archive stage shows a user, one function each. */

export const folderExists = () => 'period folder already exists; use --force to replace it';

export const badExportName = (name: string) => `invalid export file name: ${name}`;

export const unreadableResults = () => 'results.json missing or unreadable';

export const lockWaiting = (lock: string, holder: string) =>
  `waiting for ${holder}, which is writing this pack's archive (lock ${lock})`;

export const lockTimeout = (lock: string, holder: string) =>
  `${holder} has held ${lock} for over five minutes; if no build of this pack is running, delete that file and build again`;

export const lockLost = (lock: string) =>
  `lost the archive lock ${lock} (this run stalled and another took the folder over); nothing was replaced, build again`;
