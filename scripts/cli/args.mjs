// Option parsing for the command line: one positional FILE and `--name value` / `--flag` options.

/** A mistake in how the command was called (exit code 2). */
export class UsageError extends Error {}

/**
 * Parse `argv` against a spec: 'flag' (no value), 'number', or an array of allowed words.
 * Returns `{ file, options }`; unknown options and bad values are UsageErrors.
 */
export function parseArgs(argv, spec) {
  const options = {};
  let file;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (!arg.startsWith('--')) {
      if (file !== undefined) throw new UsageError(`unexpected argument "${arg}"`);
      file = arg;
      continue;
    }
    const [name, inline] = arg.slice(2).split(/=(.*)/s, 2);
    const kind = spec[name];
    if (kind === undefined) throw new UsageError(`unknown option --${name}`);
    if (kind === 'flag') {
      options[name] = true;
      continue;
    }
    const value = inline ?? argv[++i];
    if (value === undefined) throw new UsageError(`--${name} needs a value`);
    if (kind === 'number') {
      const n = Number(value);
      if (!Number.isFinite(n) || n <= 0) throw new UsageError(`--${name} must be a positive number, got "${value}"`);
      options[name] = n;
    } else if (!kind.includes(value)) {
      throw new UsageError(`--${name} must be one of ${kind.join(', ')}, got "${value}"`);
    } else {
      options[name] = value;
    }
  }
  if (file === undefined) throw new UsageError('missing FILE');
  return { file, options };
}
