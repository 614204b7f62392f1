/**
 * Whose device copy and queue this browser holds: one user of one company. Kept in localStorage
 * (read synchronously at start), cleared when they sign out.
 */
export interface FieldOwner {
  userId: string;
  companyId: string;
}

const KEY = "eavesight:device-owner";

export const ownerKey = (owner: FieldOwner) => `${owner.userId}:${owner.companyId}`;

export const fieldOwner = {
  read(): FieldOwner | null {
    try {
      const parsed = JSON.parse(window.localStorage.getItem(KEY) ?? "null") as Partial<FieldOwner> | null;
      return typeof parsed?.userId === "string" && typeof parsed.companyId === "string" ? { userId: parsed.userId, companyId: parsed.companyId } : null;
    } catch {
      return null;
    }
  },
  write(owner: FieldOwner): void {
    try {
      window.localStorage.setItem(KEY, JSON.stringify(owner));
    } catch {
      // storage disabled: the copy lasts for this page only
    }
  },
  clear(): void {
    try {
      window.localStorage.removeItem(KEY);
    } catch {
      // nothing stored
    }
  },
};
