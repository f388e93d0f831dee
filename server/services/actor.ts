import type { PublicUser } from "../../shared/api/auth";

/**
 * Who a service writes for: the signed-in user and the request's address (for audit rows).
 * The same shape cohorts, invitations and assignments declare locally, plus one flag.
 */
export interface Actor {
  user: PublicUser;
  ip: string | undefined;
  /**
   * Set only by the demo seed, which writes the school's invented past as its people. That
   * past did not happen on this server, so it leaves no audit rows and e-mails nobody.
   */
  demoHistory?: true;
}

/** Something a person did on this server: it is audited, and the people it concerns are e-mailed. */
export const isLive = (actor: Actor): boolean => actor.demoHistory !== true;
