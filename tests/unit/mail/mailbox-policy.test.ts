import type { IncomingMessage } from 'node:http';
import { describe, expect, it } from 'vitest';
import { isLoopbackAddress, isLoopbackHost, mailboxMode, mayReadMailbox } from '../../../server/mail/mailbox-policy.ts';

const request = (remoteAddress: string | undefined, headers: Record<string, string> = {}) => ({ socket: { remoteAddress }, headers }) as unknown as IncomingMessage;

describe('loopback addresses', () => {
  it('knows 127.0.0.0/8 (RFC 1122 3.2.1.3), ::1 (RFC 4291 2.5.3) and the IPv4-mapped form (RFC 4291 2.5.5.2)', () => {
    for (const address of ['127.0.0.1', '127.8.9.10', '::1', '0:0:0:0:0:0:0:1', '::ffff:127.0.0.1', '::FFFF:127.0.0.1']) expect(isLoopbackAddress(address), address).toBe(true);
  });

  it('refuses every other address, including private LAN ranges (RFC 1918) and the unspecified address', () => {
    for (const address of ['192.168.1.20', '10.0.0.5', '172.16.4.4', '::ffff:192.168.1.20', 'fe80::1', '0.0.0.0', '::', '128.0.0.1', '', undefined]) expect(isLoopbackAddress(address), String(address)).toBe(false);
  });

  it('treats localhost and loopback addresses as hosts only this machine reaches, 0.0.0.0 and :: as open ones', () => {
    expect(['127.0.0.1', 'localhost', '::1', '[::1]'].map(isLoopbackHost)).toEqual([true, true, true, true]);
    expect(['0.0.0.0', '::', '192.168.1.20', 'stoves.example.org'].map(isLoopbackHost)).toEqual([false, false, false, false]);
  });
});

describe('who may read the local mailbox', () => {
  it('on a loopback host: callers on this machine only, and never a request relayed by a proxy', () => {
    const mode = mailboxMode({ host: '127.0.0.1', openToNetwork: false });
    expect(mode).toBe('loopback');
    expect(mayReadMailbox(mode, request('127.0.0.1'))).toBe(true);
    expect(mayReadMailbox(mode, request('::ffff:127.0.0.1'))).toBe(true);
    expect(mayReadMailbox(mode, request('192.168.1.20'))).toBe(false);
    // A reverse proxy on this machine connects from 127.0.0.1 on behalf of someone else.
    expect(mayReadMailbox(mode, request('127.0.0.1', { 'x-forwarded-for': '203.0.113.9' }))).toBe(false);
    expect(mayReadMailbox(mode, request('127.0.0.1', { forwarded: 'for=203.0.113.9' }))).toBe(false);
  });

  it('on a host others can reach: no mailbox at all, unless the operator opens it to the network', () => {
    expect(mailboxMode({ host: '0.0.0.0', openToNetwork: false })).toBe('off');
    expect(mayReadMailbox('off', request('127.0.0.1'))).toBe(false);
    expect(mailboxMode({ host: '0.0.0.0', openToNetwork: true })).toBe('network');
    expect(mayReadMailbox('network', request('192.168.1.20'))).toBe(true);
  });
});
