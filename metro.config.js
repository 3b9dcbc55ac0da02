// Learn more: the default Expo Metro config, with server-only folders kept out of the bundle.
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.blockList = [/\/\.data\/.*/, /\/\.artifacts\/.*/, /\/dist\/.*/, /\/server\/.*/];

module.exports = config;
