// Expo's flat config; generated and local-only folders are not ours to lint.
const { defineConfig } = require('eslint/config');
const expoConfig = require('eslint-config-expo/flat');

module.exports = defineConfig([
  expoConfig,
  {
    ignores: ['dist/**', 'node_modules/**', '.expo/**', 'test/artifacts/**', 'data/**'],
  },
  {
    // A module that defines a type builds nothing; import it as a type so no cycle comes back.
    rules: { 'import/no-cycle': ['error', { ignoreExternal: true }] },
  },
]);
