// Narrow schemas for every argument the renderer may send over IPC. Main checks each call
// against these before doing anything; anything else is rejected with a message naming the
// channel and field.
import { z } from 'zod';
import type { InvokeChannel, InvokeChannels } from '../../types/desktop-api.js';
import { checkScenarioText, MAX_SCENARIO_CHARS } from './scenario-check.js';

/** A bare file name: no directory parts, no control characters, sensible length. */
const bareFileName = (extension: string) =>
  z
    .string()
    .min(1)
    .max(200)
    .regex(/^[^/\\:*?"<>|]+$/, 'must be a file name without folders or special characters')
    .refine((name) => [...name].every((ch) => ch.charCodeAt(0) >= 0x20), 'must not contain control characters')
    .refine((name) => name.toLowerCase().endsWith(extension), `must end with ${extension}`);

const scenarioText = z.string().max(MAX_SCENARIO_CHARS);

const saveRequest = z.strictObject({ text: scenarioText, mode: z.enum(['save', 'save-as']) });
const editReport = z.strictObject({ dirty: z.boolean(), text: scenarioText });
const csvExport = z.strictObject({ suggestedName: bareFileName('.csv'), csvText: z.string().max(200_000_000) });
/** Largest briefing document main prints, in characters of JSON (a two-week, many-strategy view stays well below). */
export const MAX_BRIEFING_CHARS = 200_000_000;

const plainRecord = z.record(z.string(), z.unknown());
/** The scenario inside a briefing passes the same identity check as a file being opened. */
const briefingScenario = plainRecord.superRefine((value, ctx) => {
  const check = checkScenarioText(JSON.stringify(value), 'briefing scenario');
  if (!check.ok) ctx.addIssue({ code: 'custom', message: check.problems[0] ?? 'is not a Zeitlight scenario' });
});
const briefingView = z.looseObject({
  baselineId: z.string().max(64),
  days: z.number().int().min(1).max(366),
  startDate: z.string().regex(/^\d{4}-\d{2}-\d{2}$/),
  strategies: z.array(z.unknown()).max(1000),
  personas: z.array(z.unknown()).max(1000),
  runs: z.array(z.unknown()).max(100_000),
});
const briefingCohort = z.looseObject({ occupants: z.number().int().min(1).max(1_000_000), seed: z.number().int().nullable(), ranges: z.array(z.unknown()).max(100_000) });
const briefingRequest = z
  .strictObject({
    kind: z.literal('zeitlight-briefing'),
    paper: z.enum(['A4', 'Letter']),
    generatedOn: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'must be a date YYYY-MM-DD'),
    zeitlightVersion: z.string().min(1).max(40),
    client: z.string().max(500).optional(),
    scenario: briefingScenario,
    view: briefingView,
    cohort: briefingCohort.optional(),
  })
  .refine((doc) => JSON.stringify(doc).length <= MAX_BRIEFING_CHARS, `must be at most ${MAX_BRIEFING_CHARS} characters of JSON`);
const pdfExport = z.strictObject({ suggestedName: bareFileName('.pdf'), briefing: briefingRequest });

type ArgsSchema<C extends InvokeChannel> = z.ZodType<InvokeChannels[C]['args']>;

export const CHANNEL_ARGUMENTS: { [C in InvokeChannel]: ArgsSchema<C> } = {
  'document:initial': z.tuple([]),
  'document:open': z.tuple([]),
  'document:save': z.tuple([saveRequest]),
  'document:edited': z.tuple([editReport]),
  'export:csv': z.tuple([csvExport]),
  'export:pdf': z.tuple([pdfExport]),
};

export type ArgumentCheck<C extends InvokeChannel> = { ok: true; args: InvokeChannels[C]['args'] } | { ok: false; message: string };

export function checkChannelArguments<C extends InvokeChannel>(channel: C, args: readonly unknown[]): ArgumentCheck<C> {
  const schema = CHANNEL_ARGUMENTS[channel] as ArgsSchema<C> | undefined;
  if (schema === undefined) return { ok: false, message: `unknown channel ${String(channel)}` };
  const parsed = schema.safeParse(args);
  if (parsed.success) return { ok: true, args: parsed.data };
  const first = parsed.error.issues[0];
  const where = first === undefined ? '' : first.path.map(String).join('.');
  return { ok: false, message: `${channel}: argument ${where || '(list)'} ${first?.message ?? 'is invalid'}` };
}
