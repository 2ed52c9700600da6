/**
 * Who is signed in on this device, as far as the app knows: the id the last /auth/me answered
 * with (null signed out, undefined not known yet). Entries waiting to be sent are held until the
 * person who typed them is the one signed in, so nothing goes out under another person's session.
 */
type Owner = string | null | undefined;

let current: Owner;
let currentName = '';
const waiting = new Set<() => void>();

export function setSessionOwner(id: string | null, name = ''): void {
  current = id;
  currentName = name;
  for (const wake of [...waiting]) wake();
}

export const sessionOwner = (): Owner => current;
export const sessionOwnerName = (): string => currentName;

/** Resolves when `ownerId` is the signed-in person (at once, if they already are). */
export function whenSignedInAs(ownerId: string): Promise<void> {
  if (current === ownerId) return Promise.resolve();
  return new Promise((resolve) => {
    const wake = () => {
      if (current !== ownerId) return;
      waiting.delete(wake);
      resolve();
    };
    waiting.add(wake);
  });
}
