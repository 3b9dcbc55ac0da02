// The default Expo Metro config, with the project's own server-only and generated folders kept
// out of the bundle. Anchored at the project root so packages with a `dist/` or `server/` folder still resolve.
const path = require('path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
const escape = (s) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
config.resolver.blockList = ['.data', '.artifacts', 'dist', 'server', '__tests__'].map(
  (dir) => new RegExp(`^${escape(path.join(__dirname, dir))}/.*`),
);

module.exports = config;
