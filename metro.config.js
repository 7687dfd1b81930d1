// Expo's default Metro settings, with one change to how the web export shares modules between route scripts
// (scripts/metro/route-chunks.js): the script every page loads holds only what the layouts need.
const { getDefaultConfig } = require('expo/metro-config');
require('./scripts/metro/route-chunks').install();

module.exports = getDefaultConfig(__dirname);
