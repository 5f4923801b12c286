// Whether `npm start` turns on the developer tools (the captured-mail page at /dev/mail). That page shows reset
// and sign-up links, so a plain `npm start` leaves it off; `npm start -- --dev-tools` (or DEV_TOOLS=true in the
// environment) turns it on for a local development run, and even then only admins can open it.
export function wantsDevTools(argv, env) {
  return argv.includes('--dev-tools') || env.DEV_TOOLS === 'true';
}
