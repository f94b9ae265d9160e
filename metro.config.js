// Metro bundles only client code: server, database, scripts, tests and local data stay out,
// so an import of server code from app/ fails the web export instead of shipping it.
const path = require('path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
const root = __dirname.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const sep = path.sep === '\\' ? '\\\\' : '/';
const blocked = ['server', 'db', 'scripts', '__tests__', '\\.data', 'dist', '\\.ci'];
config.resolver.blockList = blocked.map((dir) => new RegExp(`^${root}${sep}${dir}${sep}.*`));

module.exports = config;
