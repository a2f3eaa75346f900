import { z } from 'zod';

const messageSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
});

export type InboxMessage = z.infer<typeof messageSchema>;

/** Reads the messages kept by the local mail fake (development mode only). */
export async function readDevInbox(inboxUrl: string): Promise<InboxMessage[]> {
  const response = await fetch(new URL('/messages', inboxUrl), { signal: AbortSignal.timeout(3_000) });
  if (!response.ok) throw new Error(`mail fake answered ${response.status}`);
  const body = z.object({ messages: z.array(messageSchema) }).parse(await response.json());
  return body.messages;
}
