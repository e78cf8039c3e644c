import { isAPIError } from "better-auth/api";
import { HttpError } from "../http/errors";

/** better-auth's error codes, in the words the app shows (and the status that fits). */
const MESSAGES: Record<string, [number, string]> = {
  USER_IS_ALREADY_A_MEMBER_OF_THIS_ORGANIZATION: [409, "That person is already a member of this shop."],
  USER_IS_ALREADY_INVITED_TO_THIS_ORGANIZATION: [
    409,
    "That e-mail already has a pending invitation: re-send it from the list instead.",
  ],
  YOU_CANNOT_LEAVE_THE_ORGANIZATION_AS_THE_ONLY_OWNER: [
    409,
    "A shop keeps at least one owner: make someone else an owner first.",
  ],
  YOU_CANNOT_LEAVE_THE_ORGANIZATION_WITHOUT_AN_OWNER: [
    409,
    "A shop keeps at least one owner: make someone else an owner first.",
  ],
  INVITATION_NOT_FOUND: [404, "No such pending invitation."],
  MEMBER_NOT_FOUND: [404, "No such member in this shop."],
  INVALID_PASSWORD: [400, "The current password is not right."],
  INVITATION_LIMIT_REACHED: [409, "This shop has too many pending invitations; cancel some first."],
};

/** Calls a better-auth endpoint from a route and turns its refusal into our error shape. */
export async function authCall<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (err) {
    if (!isAPIError(err)) throw err;
    const code = (err.body as { code?: string } | undefined)?.code ?? "";
    const known = MESSAGES[code];
    if (known) throw new HttpError(known[0], known[1]);
    const status = err.statusCode >= 400 && err.statusCode < 500 ? err.statusCode : 500;
    if (status === 500) throw err;
    throw new HttpError(status, err.body?.message ?? "That could not be done.");
  }
}
