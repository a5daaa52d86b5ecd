/** Parses a time-to-live such as `900`, `900s`, `15m`, `15 min`, `12h` or `30 days` into whole seconds. */
export function parseDurationSeconds(value: string): number {
  const match = /^\s*(\d+)\s*([a-z]*)\s*$/i.exec(value);
  if (!match) throw new RangeError(`"${value}" is not a duration (examples: 900, 15m, 15 min, 12h, 30d)`);
  const amount = Number(match[1]);
  const unit = match[2].toLowerCase();
  const factor = UNIT_SECONDS[unit];
  if (factor === undefined) throw new RangeError(`"${value}" has an unknown unit "${unit}" (use s, m, h or d)`);
  const seconds = amount * factor;
  if (!Number.isSafeInteger(seconds) || seconds <= 0) throw new RangeError(`"${value}" must be a positive duration`);
  return seconds;
}

const UNIT_SECONDS: Record<string, number> = {
  '': 1, s: 1, sec: 1, secs: 1, second: 1, seconds: 1,
  m: 60, min: 60, mins: 60, minute: 60, minutes: 60,
  h: 3600, hr: 3600, hrs: 3600, hour: 3600, hours: 3600,
  d: 86400, day: 86400, days: 86400,
};
