import { type FieldProblem, ValidationFailedError } from '../../common/domain-error';
import { ANTENNA_ROLES, type AntennaRole } from './antenna-roles';

export interface PortAssignment {
  readonly port: number;
  readonly radioId: number;
  readonly role: AntennaRole;
}

/**
 * Checks a PUT body of port assignments against the file's port count and the product's radios; every
 * problem names its field as `[index].port`, `[index].radioId` or `[index].role`, and all are reported at once.
 */
export function checkPortAssignments(body: unknown, ports: number, radioIds: ReadonlySet<number>): PortAssignment[] {
  if (!Array.isArray(body)) throw new ValidationFailedError([{ field: 'body', message: 'must be a list of { port, radioId, role }' }]);
  const problems: FieldProblem[] = [];
  const seenPorts = new Map<number, number>();
  const seenAntennas = new Map<string, number>();
  const out: PortAssignment[] = [];
  body.forEach((item: unknown, index) => {
    const at = `[${index}]`;
    if (typeof item !== 'object' || item === null) {
      problems.push({ field: at, message: 'must be an object { port, radioId, role }' });
      return;
    }
    const { port, radioId, role } = item as Record<string, unknown>;
    let good = true;
    if (typeof port !== 'number' || !Number.isInteger(port) || port < 1 || port > ports) {
      problems.push({ field: `${at}.port`, message: `must be a port of the file, 1 to ${ports}` });
      good = false;
    } else if (seenPorts.has(port)) {
      problems.push({ field: `${at}.port`, message: `port ${port} is already assigned at [${seenPorts.get(port)}]` });
      good = false;
    }
    if (typeof radioId !== 'number' || !radioIds.has(radioId)) {
      problems.push({ field: `${at}.radioId`, message: 'must be a radio of this product' });
      good = false;
    }
    if (typeof role !== 'string' || !(ANTENNA_ROLES as readonly string[]).includes(role)) {
      problems.push({ field: `${at}.role`, message: `must be one of ${ANTENNA_ROLES.join(', ')}` });
      good = false;
    }
    if (!good) return;
    const antenna = `${radioId as number}/${role as string}`;
    if (seenAntennas.has(antenna)) {
      problems.push({ field: `${at}.role`, message: `this radio's ${role as string} antenna is already port ${out[seenAntennas.get(antenna)!].port}` });
      return;
    }
    seenPorts.set(port as number, index);
    seenAntennas.set(antenna, out.length);
    out.push({ port: port as number, radioId: radioId as number, role: role as AntennaRole });
  });
  if (problems.length) throw new ValidationFailedError(problems);
  return out.sort((a, b) => a.port - b.port);
}
