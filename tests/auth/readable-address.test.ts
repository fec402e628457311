import { describe, expect, it } from 'vitest';
import { readableAddress } from '../../server/services/auth/readable-address';

// Expected forms from RFC 5952 (recommended IPv6 text: lower case, longest zero run as ::,
// no leading zeros) and RFC 4291 §2.5.5.2 (IPv4-mapped addresses).
describe('addresses as a person reads them', () => {
  it('writes the auth library\'s full IPv6 form the short way', () => {
    expect(readableAddress('0000:0000:0000:0000:0000:0000:0000:0001')).toBe('::1');
    expect(readableAddress('2001:0db8:0000:0000:0000:ff00:0042:8329')).toBe('2001:db8::ff00:42:8329');
    expect(readableAddress('2001:0DB8:0000:0000:0001:0000:0000:0001')).toBe('2001:db8::1:0:0:1');
  });

  it('shows an IPv4-mapped address as IPv4 and leaves IPv4 as it is', () => {
    expect(readableAddress('::ffff:192.0.2.4')).toBe('192.0.2.4');
    expect(readableAddress('198.51.100.23')).toBe('198.51.100.23');
  });

  it('keeps what is not an address, and null for none', () => {
    expect(readableAddress('unknown')).toBe('unknown');
    expect(readableAddress(null)).toBeNull();
    expect(readableAddress('')).toBeNull();
  });
});
