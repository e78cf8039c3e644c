import type { ShopMember } from "../auth/shop-access";
import { createCasting } from "../castings/service";
import { addComment } from "../comments/service";
import { diagnoseCasting } from "../diagnosis/service";
import { addMark } from "../marks/service";
import { createMelt } from "../melts/service";
import { addFix } from "../followups/service";
import { confirmCause, requestReview } from "../review/service";
import { storePhoto } from "../photos/service";
import { drawCasting } from "./demo-drawings";
import { DEMO_MELTS, type DemoCasting } from "./demo-notebook";

type Crew = Record<"owner" | "mentor" | "caster", { id: string; name: string }>;

const dayAgo = (days: number) => new Date(Date.now() - days * 864e5).toISOString().slice(0, 10);

/**
 * Stores the demo notebook through the same services the API uses, so every value passes the same
 * checks a person's input does, and photos go through the same sharp pipeline into the object store.
 */
export async function seedDemoNotebook(shopId: string, crew: Crew) {
  const as = (role: keyof Crew): ShopMember => ({ userId: crew[role].id, userName: crew[role].name, shopId, role });
  let picture = 0;
  const made: { id: number; partName: string; daysAgo: number; learned: DemoCasting["learned"] }[] = [];
  for (const { daysAgo, by, castings, ...melt } of DEMO_MELTS) {
    const who = as(by);
    const { id: meltId } = await createMelt(who, { ...melt, pouredOn: dayAgo(daysAgo) });
    for (const { photo, marks = [], comments = [], diagnose, ...casting } of castings) {
      const plain = marks.map(({ draw: _d, ...mark }) => mark);
      const { id } = await createCasting(who, meltId, { ...casting, marks: photo ? [] : plain });
      if (photo) {
        const image = await drawCasting(
          photo,
          marks.map((m) => m.draw),
          ++picture,
        );
        const { id: photoId } = await storePhoto(who, id, image);
        for (const [i, mark] of plain.entries())
          await addMark(who, id, { ...mark, photoId, x: marks[i].draw.x, y: marks[i].draw.y });
      }
      for (const c of comments) await addComment(as(c.by), id, c.body);
      if (diagnose) await diagnoseCasting(who, id);
      if (casting.askReview) await requestReview(as("caster"), id, casting.askReview);
      made.push({ id, partName: casting.partName, daysAgo, learned: casting.learned });
    }
  }
  // The learning loop on a few cases: the mentor's word on the cause, and the fix tried on the same part's
  // next casting from a later melt, judged where the demo says how it came out.
  for (const c of made) {
    if (!c.learned) continue;
    await confirmCause(as("mentor"), c.id, { causeId: c.learned.cause, note: c.learned.note });
    if (!c.learned.fix) continue;
    const next = made.find((n) => n.partName === c.partName && n.daysAgo < c.daysAgo);
    await addFix(as("caster"), c.id, {
      fix: c.learned.fix,
      nextCastingId: c.learned.worked ? next?.id : undefined,
      worked: c.learned.worked && next ? c.learned.worked : undefined,
    });
  }
}
