// Where the app under test lives. scripts/test.mjs sets these; a test run outside it fails loudly.
function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`tests/helpers/env: ${name} is not set; run the tests through \`npm test\``);
  return value;
}

export const testEnv = {
  get appUrl(): string {
    return required('APP_URL');
  },
  get databaseUrl(): string {
    return required('DATABASE_URL');
  },
  get mailDir(): string {
    return required('MAIL_CAPTURE_DIR');
  },
  get outputDir(): string {
    return required('TEST_OUTPUT_DIR');
  },
  get chromiumPath(): string {
    return process.env['CHROMIUM_PATH'] || '/usr/bin/chromium';
  },
};
