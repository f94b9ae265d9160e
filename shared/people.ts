import { z } from 'zod';

/** A person as other records name them: id and display name. */
export const personRefSchema = z.object({ id: z.string(), name: z.string() });
export type PersonRef = z.infer<typeof personRefSchema>;
