import ipaddr from 'ipaddr.js';

/**
 * An address as people write it. The auth library stores addresses normalised for rate limiting
 * (IPv6 written out in full, e.g. 0000:…:0001); a person reading their session list expects ::1,
 * 2001:db8::7 or 192.0.2.4 (IPv4-mapped IPv6 shown as IPv4).
 */
export function readableAddress(stored: string | null): string | null {
  if (!stored) return null;
  if (!ipaddr.isValid(stored)) return stored;
  const parsed = ipaddr.parse(stored);
  if (parsed.kind() === 'ipv6') {
    const v6 = parsed as ipaddr.IPv6;
    return v6.isIPv4MappedAddress() ? v6.toIPv4Address().toString() : v6.toRFC5952String();
  }
  return parsed.toString();
}
