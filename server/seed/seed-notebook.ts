import type { ShopMember } from "../auth/shop-access";
import { createCasting } from "../castings/service";
import { addComment } from "../comments/service";
import { diagnoseCasting } from "../diagnosis/service";
import { addMark } from "../marks/service";
import { createMelt } from "../melts/service";
import { storePhoto } from "../photos/service";
import { drawCasting } from "./demo-drawings";
import { DEMO_MELTS } from "./demo-notebook";

type Crew = Record<"owner" | "mentor" | "caster", { id: string; name: string }>;

const dayAgo = (days: number) => new Date(Date.now() - days * 864e5).toISOString().slice(0, 10);

/**
 * Stores the demo notebook through the same services the API uses, so every value passes the same
 * checks a person's input does, and photos go through the same sharp pipeline into the object store.
 */
export async function seedDemoNotebook(shopId: string, crew: Crew) {
  const as = (role: keyof Crew): ShopMember => ({ userId: crew[role].id, userName: crew[role].name, shopId, role });
  let picture = 0;
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
    }
  }
}
