/** One problem with the user's input, printed as `file:line: message` (line and column 1-based when known). */
export interface Problem {
  file: string;
  line: number | null;
  column: number | null;
  message: string;
  /** How many problems the line stands for, when it counts ones not listed (`12 more like the 3 above`). */
  count?: number;
}

/** Bad input (config or data): the CLI prints every problem and exits with code 2. */
export class InputError extends Error {
  readonly problems: Problem[];
  constructor(problems: Problem[]) {
    super(problems.map(formatProblem).join('\n'));
    this.name = 'InputError';
    this.problems = problems;
  }
}

/** `file:line:column: message`, leaving out what is unknown. */
export function formatProblem(p: Problem): string {
  const where = [p.file, p.line ?? undefined, p.line != null ? (p.column ?? undefined) : undefined]
    .filter((x) => x !== undefined)
    .join(':');
  return `${where}: ${p.message}`;
}
