// Expo's own Metro settings, with one change for the web bundle's size.
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);

// Metro keeps every export a module names, used or not, so zod's entry points would ship all of zod's
// ~45 message locales (about 250 KB before gzip) in the first load. Only English is ever used.
const ZOD_ENTRY = /[\\/]node_modules[\\/]zod[\\/]v4[\\/](classic|core)[\\/]/;
const englishOnly = path.resolve(__dirname, 'src/lib/zod-locales-en.ts');
const resolveRequest = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (moduleName === '../locales/index.js' && ZOD_ENTRY.test(context.originModulePath)) {
    return { type: 'sourceFile', filePath: englishOnly };
  }
  return (resolveRequest ?? context.resolveRequest)(context, moduleName, platform);
};

module.exports = config;
