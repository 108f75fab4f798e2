// yargs reads a value that starts with a minus sign ("-0.5 barg") as more
// options. A quantity is a number first, so an argument that starts with a
// minus and a digit, right after an option that takes a value, is joined to
// that option: `-p "-0.5 barg"` becomes `-p=-0.5 barg`.

const NEGATIVE_NUMBER = /^-(?:\d|\.\d)/;
const OPTION = /^--?[A-Za-z][\w-]*$/;

export function joinNegativeValues(argv: readonly string[], flags: ReadonlySet<string>): string[] {
  const joined: string[] = [];
  for (const arg of argv) {
    const previous = joined[joined.length - 1];
    const name = previous?.replace(/^--?/, '');
    if (NEGATIVE_NUMBER.test(arg) && previous !== undefined && OPTION.test(previous) && name !== undefined && !flags.has(name)) {
      joined[joined.length - 1] = `${previous}=${arg}`;
    } else {
      joined.push(arg);
    }
  }
  return joined;
}
