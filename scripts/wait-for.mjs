// Waits until a URL answers 200 (at most 60 s), so scripts start using the app only when it is ready.
const url = process.argv[2];
const deadline = Date.now() + 60_000;
while (Date.now() < deadline) {
  try {
    const response = await fetch(url);
    if (response.ok) process.exit(0);
  } catch {
    // not listening yet
  }
  await new Promise((resolve) => setTimeout(resolve, 250));
}
console.error(`${url} did not answer within 60 s`);
process.exit(1);
