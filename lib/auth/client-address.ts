import { getIP } from "better-auth/api";
import { env } from "@/lib/env";

// Where the client's address comes from. Next.js keeps an X-Forwarded-For that the client
// sent itself, so no forwarded header is believed unless the operator names the reverse
// proxies in front of Cavitas (CAVITAS_TRUSTED_PROXIES); then the chain is read right to
// left and the right-most address that is not one of those proxies is the client. Without
// a proxy every client shares one address bucket: with the default loopback binding they
// are all this machine anyway, and the per-account limit still holds for each account.
export function ipAddressSettings(trustedProxies: string[]) {
  return trustedProxies.length > 0 ? { ipAddressHeaders: ["x-forwarded-for"], trustedProxies } : { ipAddressHeaders: [] as string[] };
}

/** The client's address as better-auth resolves it for its limiter, or null when none is trusted. */
export function clientAddress(headers: Headers): string | null {
  return getIP(headers, { advanced: { ipAddress: ipAddressSettings(env().trustedProxies) } });
}
