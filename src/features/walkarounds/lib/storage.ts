// localStorage that never throws: private mode, a full disk or a blocked store must not break a
// walkaround in the yard; the form then simply lives in memory only.

export function readJson<T>(key: string): T | null {
  try {
    const text = localStorage.getItem(key);
    return text ? (JSON.parse(text) as T) : null;
  } catch {
    return null;
  }
}

/** false when the value could not be stored */
export function writeJson(key: string, value: unknown): boolean {
  try {
    localStorage.setItem(key, JSON.stringify(value));
    return true;
  } catch {
    return false;
  }
}

export function removeKey(key: string): void {
  try {
    localStorage.removeItem(key);
  } catch {
    // nothing stored, nothing to remove
  }
}

export { newOutboxId as newClientId } from '../../../lib/outbox/outbox-id';
