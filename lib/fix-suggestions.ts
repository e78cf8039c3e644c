import type { CauseOption } from "./rulebook-schemas";

/**
 * The fixes "record a fix" offers, in order: the confirmed cause's (for the casting's metal), then any
 * ticked on the likely causes that are not among them, then the other likely causes' fixes, best cause
 * first. Each fix once. `confirmed` is null until a mentor confirms a rulebook cause.
 */
export type FixSuggestions = { confirmed: { title: string; fixes: string[] } | null; others: string[] };

export function fixSuggestions(opts: {
  confirmedCauseId: string | null | undefined;
  rulebook: CauseOption[] | undefined;
  ranked: { id: string; fixes: string[] }[];
  ticked: string[];
}): FixSuggestions {
  const cause = opts.confirmedCauseId ? opts.rulebook?.find((c) => c.id === opts.confirmedCauseId) : undefined;
  // Before the rulebook list arrives, the confirmed cause's fixes from the diagnosis stand in.
  const fromRanked = opts.ranked.find((c) => c.id === opts.confirmedCauseId);
  const confirmedFixes = cause?.fixes ?? fromRanked?.fixes ?? [];
  const seen = new Set(confirmedFixes);
  const others: string[] = [];
  for (const f of [...opts.ticked, ...opts.ranked.flatMap((c) => c.fixes)])
    if (!seen.has(f)) {
      seen.add(f);
      others.push(f);
    }
  return {
    confirmed: cause || fromRanked ? { title: cause?.title ?? "", fixes: confirmedFixes } : null,
    others,
  };
}

/**
 * How each suggested fix reads in a person's units: the suggestions and ticks are kept by the fix's SI
 * text, and the causes carry the same fix as a template with quantities (`fixTemplates`, index for index).
 */
export function fixWords(
  causes: { fixes: string[]; fixTemplates?: string[] }[],
  say: (template: string) => string,
): (fix: string) => string {
  const words = new Map<string, string>();
  for (const c of causes) c.fixes.forEach((f, i) => c.fixTemplates?.[i] && words.set(f, say(c.fixTemplates[i])));
  return (fix) => words.get(fix) ?? fix;
}
