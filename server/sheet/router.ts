import { Router } from "express";
import { z } from "zod";
import { allow, currentMember, requireShopMember } from "../auth/shop-access";
import { parseOr400 } from "../http/errors";
import { idParam } from "../notebook/shared";
import { unitsOf } from "../people/service";
import { caseSheet } from "./content";
import { caseSheetPdf, PAPER_SIZES } from "./pdf";
import { VIEWER_DOCUMENT_POLICY } from "../http/security-headers";

export const sheetRouter = Router();

const sheetQuery = z.object({
  paper: z.enum(PAPER_SIZES, { error: "paper must be a4 or letter" }).default("a4"),
});

/** A casting's case sheet as a PDF, in the reader's units; any member of the shop may print one. */
sheetRouter.get("/:id/sheet.pdf", requireShopMember, allow({ casebook: ["read"] }), async (req, res) => {
  const m = currentMember(req);
  const { paper } = parseOr400(sheetQuery, req.query);
  const id = idParam(req.params.id, "No such casting");
  const sheet = await caseSheet(m.shopId, id, await unitsOf(m.userId));
  const pdf = await caseSheetPdf(sheet, paper, new Date());
  res.set({
    "Content-Type": "application/pdf",
    "Content-Disposition": `inline; filename="case-sheet-${id}-${paper}.pdf"`,
    "Cache-Control": "private, no-store",
    "Content-Security-Policy": VIEWER_DOCUMENT_POLICY,
  });
  res.send(pdf);
});
