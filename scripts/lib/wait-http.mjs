// wait-http.mjs URL [seconds]: exits 0 once URL answers, 1 after the timeout.
const [url, seconds = "60"] = process.argv.slice(2);
const deadline = Date.now() + Number(seconds) * 1000;
while (Date.now() < deadline) {
  try {
    const res = await fetch(url);
    if (res.status < 500) process.exit(0);
  } catch {}
  await new Promise((r) => setTimeout(r, 300));
}
console.error(`no answer from ${url} after ${seconds} s`);
process.exit(1);
