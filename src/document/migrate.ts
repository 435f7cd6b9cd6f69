// Older file versions are brought up to the current one step by step before
// validation, so the schema only ever describes the current version.
import { CURRENT_VERSION } from './schema';
import { describeValue } from './labels';

/**
 * migrations[v] turns a version-v document into a version-(v+1) one (the
 * caller sets the new version number).
 * 1 -> 2: version 2 only adds fields (the surface balance's), so a version-1
 * file means the same unchanged.
 */
const migrations: Record<number, (doc: Record<string, unknown>) => Record<string, unknown>> = {
  1: (doc) => doc,
};

export type MigrateResult = { ok: true; doc: Record<string, unknown>; from: number } | { ok: false; error: string };

/** Bring a document (already known to be an object) to CURRENT_VERSION, or say why not. */
export function migrate(doc: Record<string, unknown>): MigrateResult {
  const version = doc.version;
  if (version === undefined)
    return { ok: false, error: `version is missing; it must be ${CURRENT_VERSION} for this program` };
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return { ok: false, error: `version must be a whole number from 1 (got ${describeValue(version)})` };
  }
  if (version > CURRENT_VERSION) {
    return {
      ok: false,
      error: `version ${version} is newer than this program reads (up to ${CURRENT_VERSION}); open it with a newer Tautline`,
    };
  }
  let current = doc;
  for (let v = version; v < CURRENT_VERSION; v++) {
    const step = migrations[v];
    if (!step) return { ok: false, error: `version ${v} files cannot be read by this program` };
    current = { ...step(current), version: v + 1 };
  }
  return { ok: true, doc: current, from: version };
}
