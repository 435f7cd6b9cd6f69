// Placeholder until the heat-exchange command lands; keeps main.ts's dispatch compiling.
import type { CliIO } from './io';

export function runExchange(_args: string[], io: CliIO): number {
  io.err('exchange: not available yet\n');
  return 1;
}
