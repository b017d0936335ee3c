import { Router } from 'express';
import { registerLinkRoutes } from './links.router';
import { registerBoardRoutes } from './board.router';
import { registerBookingRoutes } from './bookings.router';

/** Dealer links and the dealer's service desk: board, parts forecast, reminders, bookings. */
export function dealersRouter(): Router {
  const router = Router();
  registerLinkRoutes(router);
  registerBoardRoutes(router);
  registerBookingRoutes(router);
  return router;
}
