// Expo's flat config; generated and local-only folders are not ours to lint.
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');

module.exports = defineConfig([
  expoConfig,
  {
    ignores: ['dist/**', 'node_modules/**', '.expo/**', 'test/artifacts/**', 'data/**'],
  },
]);
