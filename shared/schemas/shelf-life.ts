import { z } from 'zod';
import { decimalId } from './common';

/** GET /api/programmes/:id/shelf-life?recipe=… : the whole programme, or one recipe and its group. */
export const shelfLifeQuerySchema = z.object({ recipe: decimalId('recipe').optional() });
export type ShelfLifeQuery = z.infer<typeof shelfLifeQuerySchema>;
