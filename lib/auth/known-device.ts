// The device cookie: a browser that signed in to an account before carries a random token for it, so
// its owner is not slowed down by someone else's wrong guesses (see rate-limit.ts).
import "server-only";
import { cookies } from "next/headers";
import { addKnownDevice, isKnownDevice, pruneKnownDevices } from "@/db/queries/known-devices";
import { cookieSecure } from "@/lib/env";
import { hashToken, newToken } from "./token";

const DEVICE_COOKIE = "farfield_device";
const DEVICE_DAYS = 180;

/** The hash of this browser's device token when it signed in to `email` before, else null. */
export async function knownDeviceFor(email: string): Promise<string | null> {
  const token = (await cookies()).get(DEVICE_COOKIE)?.value;
  if (!token) return null;
  const hash = hashToken(token);
  return (await isKnownDevice(hash, email)) ? hash : null;
}

/** After a right password: remembers this browser for `email` (a new token unless it has one for it). */
export async function rememberDevice(email: string): Promise<void> {
  if (await knownDeviceFor(email)) return;
  const token = newToken();
  await addKnownDevice(hashToken(token), email);
  (await cookies()).set(DEVICE_COOKIE, token, {
    httpOnly: true,
    secure: cookieSecure,
    sameSite: "lax",
    path: "/api/",
    maxAge: DEVICE_DAYS * 24 * 3600,
  });
  if (Math.random() < 0.05) await pruneKnownDevices(new Date(Date.now() - DEVICE_DAYS * 24 * 3600 * 1000));
}
