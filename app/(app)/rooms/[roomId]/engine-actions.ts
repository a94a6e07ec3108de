"use server";

// Server actions over the computation modules, for the room screens: the same schemas and the same
// functions as the /api/v1 computation endpoints (app/api/v1/modes, absorbers, reverb).
import type { z } from "zod";
import { fieldErrors } from "@/lib/api/zod-fields";
import { canInFirm } from "@/lib/auth/permissions";
import { requireActor } from "@/lib/auth/session";
import { flatnessMap, flatnessMapRequestSchema, modalResponse, modalResponseRequestSchema, modesRequestSchema, modeTable, roomModes } from "@/lib/modes";
import { absorberRatingRequestSchema, absorberSpectrumRequestSchema, absorptionSpectrum, rateAbsorber } from "@/lib/porous";
import { evaluateTarget, predictReverberation, reverbPredictRequestSchema, reverbTargetRequestSchema } from "@/lib/reverb";
import type { ActionResult } from "../../projects/actions";

async function compute<S extends z.ZodType, T>(schema: S, input: unknown, fn: (parsed: z.infer<S>) => T): Promise<ActionResult<T>> {
  const actor = await requireActor();
  if (!canInFirm(actor, "engine.run")) return { ok: false, code: "forbidden", message: "Your role cannot run computations." };
  const parsed = schema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some inputs need attention.", fields: fieldErrors(parsed.error) };
  try {
    return { ok: true, data: fn(parsed.data) };
  } catch (error) {
    if (error instanceof RangeError || error instanceof TypeError) return { ok: false, code: "bad_request", message: error.message };
    throw error;
  }
}

export async function roomModesAction(input: unknown) {
  return compute(modesRequestSchema, input, ({ room, maxFrequencyHz, speedOfSound, rt60Seconds }) =>
    rt60Seconds === undefined ? { modes: roomModes(room, { maxFrequencyHz, speedOfSound }) } : { modes: roomModes(room, { maxFrequencyHz, speedOfSound }), table: modeTable(room, { maxFrequencyHz, rt60Seconds, speedOfSound }) },
  );
}

export async function modalResponseAction(input: unknown) {
  return compute(modalResponseRequestSchema, input, ({ room, ...options }) => ({ levelsDb: modalResponse(room, options) }));
}

export async function flatnessMapAction(input: unknown) {
  return compute(flatnessMapRequestSchema, input, ({ room, ...options }) => {
    const map = flatnessMap(room, options);
    return { xM: map.xM, yM: map.yM, stdDevDb: Array.from(map.stdDevDb) };
  });
}

export async function absorptionSpectrumAction(input: unknown) {
  return compute(absorberSpectrumRequestSchema, input, (r) => ({ points: absorptionSpectrum(r.layers, { frequenciesHz: r.frequenciesHz, incidence: r.incidence, air: r.air }) }));
}

export async function absorberRatingAction(input: unknown) {
  return compute(absorberRatingRequestSchema, input, (r) => ({ rating: rateAbsorber(r) }));
}

export async function reverbPredictAction(input: unknown) {
  return compute(reverbPredictRequestSchema, input, (r) => ({ prediction: predictReverberation(r) }));
}

export async function reverbTargetAction(input: unknown) {
  return compute(reverbTargetRequestSchema, input, ({ target, nearMarginS, ...room }) => evaluateTarget(room, target, nearMarginS));
}
