import type { RequestHandler } from "express";

/** The header better-auth reads the client's address from (for its limits and the session record). */
export const CLIENT_ADDRESS_HEADER = "x-casebook-client-address";

/**
 * The client's address as Express works it out (TRUST_PROXY decides whether X-Forwarded-For is
 * believed), handed to better-auth in a header of our own. Whatever a client sent in that header is
 * overwritten, so changing X-Forwarded-For or this header never makes a new client for the limits.
 */
export const clientAddressForAuth: RequestHandler = (req, _res, next) => {
  req.headers[CLIENT_ADDRESS_HEADER] = req.ip ?? req.socket.remoteAddress ?? "unknown";
  next();
};
