import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { BLOCKED_PORTS } from '../../../scripts/blocked-ports.ts';
import { refuseBlockedPorts } from '../../../scripts/stack.ts';

describe('ports the stacks may use', () => {
  it("when the list is compared with Node's fetch implementation, then it is the same list", () => {
    // Outside source: undici (the fetch of Node and jsdom) keeps the Fetch Standard's bad ports in this file.
    const undici = dirname(createRequire(import.meta.url).resolve('undici/package.json'));
    const constants = readFileSync(join(undici, 'lib/web/fetch/constants.js'), 'utf8');
    const listed = constants.match(/const badPorts = [^[]*\[([^\]]*)\]/)![1];
    const ports = [...listed.matchAll(/'(\d+)'/g)].map((match) => Number(match[1]));
    expect([...BLOCKED_PORTS].sort((a, b) => a - b)).toEqual(ports.sort((a, b) => a - b));
  });

  it('when HW_PORT_OFFSET=3000 puts the demo app on 6000, then the start is refused naming the port and a usable offset', () => {
    expect(() => refuseBlockedPorts(3000)).toThrow(
      "Port 6000 (the demo stack's app, HW_PORT_OFFSET=3000) is on the browsers' and fetch's blocked-port list, so nothing could reach it. Use another offset, e.g. HW_PORT_OFFSET=3100.",
    );
    expect(() => refuseBlockedPorts(3100)).not.toThrow();
  });

  it('when the offset is 0 or 2000, then every port is allowed', () => {
    expect(() => refuseBlockedPorts(0)).not.toThrow();
    expect(() => refuseBlockedPorts(2000)).not.toThrow();
  });
});
