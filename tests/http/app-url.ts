/** Base URL of the app `npm test` serves (next start on the test database and fakes). */
export function appUrl(path = ""): string {
  const base = process.env.TEST_APP_URL;
  if (!base) throw new Error("TEST_APP_URL is not set: run these tests through `npm test`, which starts the app");
  return `${base}${path}`;
}
