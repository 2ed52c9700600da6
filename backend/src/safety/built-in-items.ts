import type { SafetySection } from '../database/schema/safety.js';

export interface SafetyItemDef {
  id: string;
  section: SafetySection;
  text: string;
}

export const SECTION_LABELS: Record<SafetySection, string> = {
  stopping: 'Stopping',
  electrical: 'Electrical',
  cutting: 'Cutting',
  people: 'People',
};

/**
 * The walk every machine gets, in our own words. Keys are stable: answers refer to them.
 * Workshops add their own items on top; these are never removed.
 */
export const BUILT_IN_ITEMS: SafetyItemDef[] = [
  {
    id: 'stop-estop-motion',
    section: 'stopping',
    text: 'The emergency stop is a hardware stop: pressed, it halts every axis at once, both sides of the gantry included.',
  },
  {
    id: 'stop-estop-power',
    section: 'stopping',
    text: 'The same emergency stop also drops the cutting power (plasma source or spindle), not only the motion.',
  },
  {
    id: 'stop-estop-reach',
    section: 'stopping',
    text: 'An emergency stop button is within reach from every place the operator stands to load, watch and unload.',
  },
  {
    id: 'stop-limits',
    section: 'stopping',
    text: 'Each limit switch was tripped by hand and stops its axis before the carriage reaches a hard stop.',
  },
  {
    id: 'stop-home',
    section: 'stopping',
    text: 'Homing finds every home switch (each side of a dual-drive gantry) and returns to the same place run after run.',
  },
  {
    id: 'elec-licensed',
    section: 'electrical',
    text: 'Mains wiring, earthing and bonding were inspected by a licensed electrician, as the local codes require.',
  },
  {
    id: 'elec-strain-relief',
    section: 'electrical',
    text: 'Every cable into a cabinet, drag chain or motor has strain relief; no conductor is bare, crushed or chafing.',
  },
  {
    id: 'elec-plasma-leads',
    section: 'electrical',
    text: 'The plasma source, torch lead, work lead and clamp are undamaged, and the work lead is fixed to clean metal.',
  },
  {
    id: 'cut-fumes',
    section: 'cutting',
    text: 'Fume extraction or ventilation runs while cutting and was seen to draw over the whole bed.',
  },
  {
    id: 'cut-fire',
    section: 'cutting',
    text: 'A suitable fire extinguisher is at hand and the area round the table is clear of anything that burns.',
  },
  {
    id: 'cut-water',
    section: 'cutting',
    text: 'Where a water table is used, its level is set and kept, with hydrogen under aluminium cuts in mind.',
  },
  {
    id: 'people-guards',
    section: 'people',
    text: 'Guards are fitted and the pinch points between gantry, stops and frame are marked.',
  },
  {
    id: 'people-briefing',
    section: 'people',
    text: 'Everyone who will run the machine had a first-use briefing: emergency stop, homing, the cutting area and protective equipment.',
  },
];

export const BUILT_IN_IDS = new Set(BUILT_IN_ITEMS.map((i) => i.id));
