import type { Request } from 'express';
import type { Connection } from '../policies';

/** Where a request comes from, unpacked for the mailbox policy: the socket's peer (never a forwarded header), any proxy header, the Host. */
export function connectionOf(req: Request): Connection {
  return {
    remoteAddress: req.socket.remoteAddress,
    forwarded: Boolean(req.get('x-forwarded-for') || req.get('forwarded') || req.get('x-real-ip')),
    host: req.get('host') ?? '',
  };
}
