/**
 * The families detector's inputs besides the catalogue: the bundled published family list
 * (names for clusters) and, with --families FILE, a user's membership list. A bad line of the
 * membership list is a one-line message naming file and line, and the run goes on; an
 * unreadable list stops the run (exit 1).
 */
import { readFamilyMembership } from '../io/familyMembership.js';
import { readPublishedFamilies, type PublishedFamilyList } from '../io/publishedFamilies.js';
import type { InputError } from '../io/types.js';
import type { FamiliesOptions } from '../detect/familiesOptions.js';
import { bundledFamilyList } from './packageInfo.js';

export interface FamiliesInputs {
  published: PublishedFamilyList;
  membership: FamiliesOptions['membership'];
  membershipRejects: InputError[]; // bad lines of the membership list
}

export async function readFamiliesInputs(membershipFile: string | undefined): Promise<FamiliesInputs> {
  const published = readPublishedFamilies(bundledFamilyList());
  if (membershipFile === undefined) return { published, membership: null, membershipRejects: [] };
  const m = await readFamilyMembership(membershipFile);
  return { published, membership: m.members, membershipRejects: m.rejects };
}

/** The stderr lines of the membership list's bad lines. */
export function membershipRejectLines(inputs: FamiliesInputs): string[] {
  return inputs.membershipRejects.map((r) => `${r.message} (line set aside from the family list)`);
}
