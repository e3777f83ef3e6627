import { z } from "zod";

import { isMachiningInputError, parseChipLoad, parseFeed, parseLength, parseSpindleSpeed } from "@/lib/machining";

/** A quantity as the author wrote it, plus its value in metric machining units. */
export type Quantity = { text: string; value: number };

// A unit is a letter or an inch/percent mark; a bare `1/8` or `18000` is ambiguous in a data sheet.
const HAS_UNIT = /[a-z"″”%]/i;

function quantitySchema(parse: (text: string) => number, example: string) {
  return z
    .string({ error: `Write this as text with its unit, e.g. ${example}.` })
    .trim()
    .min(1, `Enter a value with its unit, e.g. ${example}.`)
    .meta({ examples: example.split(" or ") })
    .transform((text, ctx): Quantity => {
      if (!HAS_UNIT.test(text)) {
        ctx.addIssue({ code: "custom", message: `“${text}” has no unit; write it e.g. as ${example}.` });
        return z.NEVER;
      }
      try {
        const value = parse(text);
        if (value <= 0) throw new RangeError(`“${text}” must be more than zero.`);
        return { text, value };
      } catch (error) {
        if (!isMachiningInputError(error) && !(error instanceof RangeError)) throw error;
        ctx.addIssue({ code: "custom", message: error.message });
        return z.NEVER;
      }
    });
}

/** Length in mm: `3.175 mm`, `1/8 in`, `0.125"`. */
export const lengthSchema = quantitySchema((t) => parseLength(t), "3.175 mm or 1/8 in");
/** Feed rate in mm/min: `1800 mm/min`, `70 in/min`. */
export const feedSchema = quantitySchema((t) => parseFeed(t), "1800 mm/min or 70 in/min");
/** Spindle speed n in rpm: `18000 rpm`. */
export const spindleSpeedSchema = quantitySchema((t) => parseSpindleSpeed(t), "18000 rpm");
/** Chip load fz in mm per tooth: `0.05 mm`, `0.002 in`. */
export const chipLoadSchema = quantitySchema((t) => parseChipLoad(t), "0.05 mm or 0.002 in");

// `40 %`, `40%`, `40 % D`, `40 % of D`.
const PERCENT = /^(\d+(?:\.\d+)?|\.\d+)\s*%(?:\s*(?:of\s+)?D)?$/i;

/** Radial depth ae: a length in mm, or a percentage of the cutter diameter D (`40 %`). */
export type RadialDepth = Quantity & { unit: "mm" | "%D" };

export const radialDepthSchema = z
  .string({ error: "Write ae as text with its unit, e.g. 2.5 mm or 40 %." })
  .trim()
  .meta({ examples: ["2.5 mm", "0.1 in", "40 %"] })
  .transform((text, ctx): RadialDepth => {
    if (!text.includes("%")) {
      const length = lengthSchema.safeParse(text);
      if (length.success) return { ...length.data, unit: "mm" };
      ctx.addIssue({ code: "custom", message: length.error.issues[0]?.message ?? "Invalid ae." });
      return z.NEVER;
    }
    const match = PERCENT.exec(text);
    if (!match) {
      ctx.addIssue({ code: "custom", message: `“${text}” is not a share of the cutter diameter; write it e.g. as 40 %.` });
      return z.NEVER;
    }
    const value = Number(match[1]);
    if (!(value > 0 && value <= 100)) {
      ctx.addIssue({ code: "custom", message: `ae “${text}” must be more than 0 % and at most 100 % of the cutter diameter.` });
      return z.NEVER;
    }
    return { text, value, unit: "%D" };
  });
