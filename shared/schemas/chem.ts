import { z } from 'zod';

export const nameStyleSchema = z.enum(['preferred', 'traditional']);

/** The largest text we accept for one structure; larger pastes are almost always a whole file of them. */
export const MAX_STRUCTURE_TEXT = 200_000;

export const describeRequestSchema = z.union([
  z.object({ smiles: z.string().max(MAX_STRUCTURE_TEXT), style: nameStyleSchema.optional() }).strict(),
  z.object({ molfile: z.string().max(MAX_STRUCTURE_TEXT), style: nameStyleSchema.optional() }).strict(),
]);
export type DescribeRequest = z.infer<typeof describeRequestSchema>;
