import { CreateSweepDto } from '../../rails/dto/create-sweep.dto.js';

/**
 * The final sweep of a finished bolt-down: a rail sweep (same fields and rules) with a station at
 * every hole. `id`, made by the browser, makes a retried save the same sweep.
 */
export class FinalSweepDto extends CreateSweepDto {}
