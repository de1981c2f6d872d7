// A choice the app remembers between sessions (e.g. the light scale): kept in the page's
// localStorage (web mode; the desktop app's renderer has its own), read back only when it is one
// of the allowed values, and ignored when storage is unavailable.
import { useCallback, useState } from 'react';

const PREFIX = 'zeitlight.';

export function readChoice<T extends string>(key: string, allowed: readonly T[], fallback: T, storage: Pick<Storage, 'getItem'> | null = safeStorage()): T {
  try {
    const value = storage?.getItem(PREFIX + key) ?? null;
    return allowed.find((a) => a === value) ?? fallback;
  } catch {
    return fallback;
  }
}

export function writeChoice(key: string, value: string, storage: Pick<Storage, 'setItem'> | null = safeStorage()): void {
  try {
    storage?.setItem(PREFIX + key, value);
  } catch {
    // private mode or storage full: the choice lasts for this session only
  }
}

function safeStorage(): Storage | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

/** React state that starts from the remembered value and remembers each change. */
export function useRememberedChoice<T extends string>(key: string, allowed: readonly T[], fallback: T): [T, (value: T) => void] {
  const [value, setValue] = useState<T>(() => readChoice(key, allowed, fallback));
  const set = useCallback(
    (next: T) => {
      setValue(next);
      writeChoice(key, next);
    },
    [key],
  );
  return [value, set];
}
