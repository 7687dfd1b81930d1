import { useState } from 'react';

export type SchemeChoice = 'system' | 'light' | 'dark';

/** Native follows the light scheme for now; the web's choice lives in color-scheme.web.ts. */
export function applyStoredScheme() {}

export function useSchemeChoice(): [SchemeChoice, (choice: SchemeChoice) => void] {
  const [choice, setChoice] = useState<SchemeChoice>('system');
  return [choice, setChoice];
}
