import { z } from 'zod';
import { apiScopes } from './v1';

/** GET /api/dev/demo-key (development only): the seeded demo API key, for the API reference page. */
export const demoApiKeySchema = z.object({
  key: z.string(),
  prefix: z.string(),
  name: z.string(),
  organisation: z.string(),
  scopes: z.array(z.enum(apiScopes)),
});
export type DemoApiKey = z.infer<typeof demoApiKeySchema>;
