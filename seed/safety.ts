import { BUILT_IN_ITEMS } from '../backend/src/safety/built-in-items.js';
import { SafetyService } from '../backend/src/safety/safety.service.js';
import type { SeedContext } from './context.js';

/*
 * Invented safety walks. The workshop added one item of its own. The plasma table's walk is partly
 * answered, with one "no" (the fume extraction is not yet ducted outside); the router's walk is
 * complete, water table and plasma leads not applicable.
 */
export async function seedSafety(ctx: SeedContext): Promise<void> {
  const { owner, technician } = ctx.demo.people;
  const { plasma, router } = ctx.machines!;
  const safety = ctx.app.get(SafetyService);
  const own = await safety.addItem(owner, {
    section: 'cutting',
    text: 'The slag tray is emptied and nothing is stored under the table.',
  });

  const plasmaAnswers: [string, 'yes' | 'no' | 'na', string?][] = [
    ['stop-estop-motion', 'yes', 'Both Y motors and X stop together; tested at three gantry positions.'],
    ['stop-estop-power', 'yes', 'Torch-on relay opens with the E-stop chain.'],
    ['stop-limits', 'yes'],
    ['stop-home', 'yes', 'Y1 and Y2 home within one step of each other, five runs.'],
    ['elec-strain-relief', 'yes'],
    [
      'cut-fumes',
      'no',
      'Down-draft fan fitted but not yet ducted outside; do not cut galvanised or stainless until it is.',
    ],
    ['cut-water', 'na', 'Down-draft table, no water.'],
  ];
  for (const [item, answer, note] of plasmaAnswers) await safety.answer(technician, plasma, item, { answer, note });

  const notApplicable = new Set(['elec-plasma-leads', 'cut-water']);
  for (const item of [...BUILT_IN_ITEMS.map((i) => i.id), own.id]) {
    await safety.answer(technician, router, item, {
      answer: notApplicable.has(item) ? 'na' : 'yes',
      note: item === 'cut-fumes' ? 'Dust extraction on the spindle shoe.' : undefined,
    });
  }
}
