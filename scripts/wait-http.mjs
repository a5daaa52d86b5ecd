// Waits until a URL answers 2xx: `node scripts/wait-http.mjs URL [seconds]`; exit 1 on time-out.
const [url, seconds = '30'] = process.argv.slice(2);
const deadline = Date.now() + Number(seconds) * 1000;
for (;;) {
  try {
    const res = await fetch(url);
    if (res.ok) process.exit(0);
  } catch {
    // not listening yet
  }
  if (Date.now() > deadline) process.exit(1);
  await new Promise((r) => setTimeout(r, 200));
}
