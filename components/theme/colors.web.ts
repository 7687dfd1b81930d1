import { lightColors, palettes, type ColorName } from '@/components/theme/palette';
import { applyStoredScheme } from '@/components/theme/color-scheme';

const cssName = (name: string) => `--il-${name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}`;

const declarations = (scheme: 'light' | 'dark') =>
  Object.entries(palettes[scheme]).map(([name, value]) => `${cssName(name)}:${value};`).join('');

/**
 * On the web every colour is a CSS custom property, so switching scheme is one attribute on <html> and no screen
 * has to re-render or read a hook: react-native-web passes `var(...)` through to the style sheet as it is.
 * System setting by default (prefers-color-scheme); data-scheme on <html> when the person chose one in Settings.
 */
function installSchemeStyles() {
  if (typeof document === 'undefined' || document.getElementById('isoledger-colors')) return;
  const style = document.createElement('style');
  style.id = 'isoledger-colors';
  style.textContent = [
    `:root{${declarations('light')}color-scheme:light;}`,
    `@media (prefers-color-scheme: dark){:root:not([data-scheme="light"]){${declarations('dark')}color-scheme:dark;}}`,
    `:root[data-scheme="dark"]{${declarations('dark')}color-scheme:dark;}`,
    `body{background-color:var(${cssName('paper')});}`,
  ].join('\n');
  document.head.appendChild(style);
}

installSchemeStyles();
applyStoredScheme();

export const colors = Object.fromEntries(Object.keys(lightColors).map((name) => [name, `var(${cssName(name)})`])) as Record<ColorName, string>;
