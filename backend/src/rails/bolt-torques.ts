/**
 * Usual tightening torque for rail bolts into steel, offered as the default when a sweep records
 * the bolts used. The one place these figures live: the UI reads them through GET /api/rails/bolt-torques.
 */

export interface BoltTorque {
  boltSize: string;
  torqueNm: number;
}

export const BOLT_TORQUES: readonly BoltTorque[] = [
  { boltSize: 'M4', torqueNm: 4.1 },
  { boltSize: 'M5', torqueNm: 8.8 },
  { boltSize: 'M6', torqueNm: 13.7 },
  { boltSize: 'M8', torqueNm: 30 },
];

export const BOLT_TORQUE_SOURCE =
  "A rail maker's table for rail bolts into steel; follow the maker's instructions for your rails.";

/** Typical bolt for a rail profile size (mm); from memory, so it is only a starting suggestion. */
export const TYPICAL_BOLT_BY_PROFILE: Readonly<Record<number, string>> = { 15: 'M4', 20: 'M5', 25: 'M6' };

export const TYPICAL_BOLT_SOURCE = 'Typical bolt per rail size, from memory: check the rail drawing.';

export function usualTorqueNm(boltSize: string): number | null {
  return BOLT_TORQUES.find((b) => b.boltSize === boltSize)?.torqueNm ?? null;
}

export function typicalBoltFor(profileSizeMm: number | null | undefined): string | null {
  return profileSizeMm ? (TYPICAL_BOLT_BY_PROFILE[profileSizeMm] ?? null) : null;
}

export function boltTorqueTable() {
  return {
    bolts: BOLT_TORQUES.map((b) => ({ ...b })),
    source: BOLT_TORQUE_SOURCE,
    typicalByProfile: Object.entries(TYPICAL_BOLT_BY_PROFILE).map(([size, boltSize]) => ({
      /** Rail profile size (the rail's width), mm. */
      profileSize: Number(size),
      boltSize,
    })),
    typicalSource: TYPICAL_BOLT_SOURCE,
  };
}
