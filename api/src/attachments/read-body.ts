import { BadRequestException, PayloadTooLargeException } from '@nestjs/common';
import type { Readable } from 'node:stream';

/**
 * Reads exactly `expected` bytes of a request body into memory. More is refused with 413 as soon as it
 * arrives (so memory stays bounded); less, or an aborted request, keeps nothing.
 */
export function readExactly(body: Readable, expected: number): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let received = 0;
    let settled = false;
    const fail = (error: Error) => {
      if (settled) return;
      settled = true;
      body.removeListener('data', onData);
      // Let the rest of the body flow away so the client can read the error answer.
      body.resume();
      reject(error);
    };
    const onData = (chunk: Buffer) => {
      received += chunk.length;
      if (received > expected) {
        fail(new PayloadTooLargeException(`The body has more than the ${expected} bytes this range (or the declared size) allows`));
        return;
      }
      chunks.push(chunk);
    };
    body.on('data', onData);
    body.once('end', () => {
      if (settled) return;
      settled = true;
      if (received < expected) reject(new BadRequestException(`The body has ${received} bytes; the range says ${expected}: nothing was kept`));
      else resolve(Buffer.concat(chunks, received));
    });
    const interrupted = () => fail(new BadRequestException('The upload was interrupted: nothing of this chunk was kept'));
    body.once('aborted', interrupted);
    body.once('error', interrupted);
    // A connection that closes without 'end' is an interruption too (whichever of these Node reports).
    body.once('close', interrupted);
  });
}
