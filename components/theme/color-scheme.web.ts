import { useState } from 'react';

export type SchemeChoice = 'system' | 'light' | 'dark';

const KEY = 'isoledger-color-scheme';

function stored(): SchemeChoice {
  try {
    const value = localStorage.getItem(KEY);
    return value === 'light' || value === 'dark' ? value : 'system';
  } catch {
    return 'system';
  }
}

function apply(choice: SchemeChoice) {
  if (typeof document === 'undefined') return;
  if (choice === 'system') delete document.documentElement.dataset.scheme;
  else document.documentElement.dataset.scheme = choice;
}

/** Puts the person's earlier choice on <html> before the first paint. */
export function applyStoredScheme() {
  apply(stored());
}

/** The scheme chosen in Settings: the system's, or light or dark by hand. Kept on this device. */
export function useSchemeChoice(): [SchemeChoice, (choice: SchemeChoice) => void] {
  const [choice, setChoice] = useState<SchemeChoice>(stored);
  const choose = (next: SchemeChoice) => {
    try {
      if (next === 'system') localStorage.removeItem(KEY);
      else localStorage.setItem(KEY, next);
    } catch {
      // Private windows may refuse storage: the choice still holds until the page is closed.
    }
    apply(next);
    setChoice(next);
  };
  return [choice, choose];
}
