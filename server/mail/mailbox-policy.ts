import { isIP } from 'node:net';
import type { IncomingMessage } from 'node:http';

/**
 * Where mail goes when no SMTP server is set:
 * - "loopback": a local mailbox, readable only by callers on this machine (the default when the
 *   server listens on a loopback address);
 * - "network": the same mailbox for any caller, only when the operator opts in
 *   (LOCAL_MAILBOX_FOR_NETWORK=true) on a server that listens beyond this machine;
 * - "off": no mailbox; mail is logged as not sent, without its text (it holds sign-in links).
 */
export type MailboxMode = 'loopback' | 'network' | 'off';

/** 127.0.0.0/8 (RFC 1122), ::1 (RFC 4291) and their IPv4-mapped form ::ffff:127.x.y.z (RFC 4291 2.5.5.2). */
export function isLoopbackAddress(address: string | undefined): boolean {
  if (!address) return false;
  const plain = address.toLowerCase().replace(/^::ffff:/, '');
  if (isIP(plain) === 4) return plain.startsWith('127.');
  return plain === '::1' || plain === '0:0:0:0:0:0:0:1';
}

/** A listening host that only this machine can reach. */
export function isLoopbackHost(host: string): boolean {
  const bare = host.replace(/^\[|\]$/g, '').toLowerCase();
  return bare === 'localhost' || isLoopbackAddress(bare);
}

export function mailboxMode({ host, openToNetwork }: { host: string; openToNetwork: boolean }): MailboxMode {
  if (isLoopbackHost(host)) return 'loopback';
  return openToNetwork ? 'network' : 'off';
}

/**
 * Whether this request may read the local mailbox. The socket's own address decides, never a
 * header; a request relayed by a proxy (Forwarded or X-Forwarded-For) comes from elsewhere, even
 * when the proxy itself runs on this machine.
 */
export function mayReadMailbox(mode: MailboxMode, req: IncomingMessage): boolean {
  if (mode === 'network') return true;
  if (mode === 'off') return false;
  if (req.headers['forwarded'] !== undefined || req.headers['x-forwarded-for'] !== undefined) return false;
  return isLoopbackAddress(req.socket.remoteAddress);
}
