// https://docs.expo.dev/guides/using-eslint/
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');
const globals = require('globals');

module.exports = defineConfig([
  expoConfig,
  {
    ignores: ['dist/*', '.data/*', '.artifacts/*', '.expo/*', '.jest-cache/*'],
  },
  {
    // Node-side config files, the server and its tools.
    files: ['*.config.js', 'babel.config.js', 'server/**', '__tests__/**'],
    languageOptions: { globals: { ...globals.node } },
  },
]);
