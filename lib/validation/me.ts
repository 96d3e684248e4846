// The signed-in user's own settings.
import { z } from 'zod';
import { UNIT_SYSTEMS } from '@/models/constants';

export const meUpdateSchema = z.object({
  units: z.enum(UNIT_SYSTEMS, { error: 'Units are metric or imperial' }),
});
export type MeUpdate = z.output<typeof meUpdateSchema>;
