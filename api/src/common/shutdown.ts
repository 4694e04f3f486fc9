import { Injectable, type BeforeApplicationShutdown } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';

/**
 * Graceful shutdown (QUALITY.md, Load and faults): from the moment a stop signal arrives, new
 * requests are answered 503 with `Connection: close` and `Retry-After`, so keep-alive clients
 * let go and the server can close; requests already running finish normally.
 */
@Injectable()
export class ShutdownState implements BeforeApplicationShutdown {
  private stopping = false;

  get isStopping(): boolean {
    return this.stopping;
  }

  beforeApplicationShutdown(): void {
    this.stopping = true;
  }

  /** Express middleware; mount it first. */
  readonly middleware = (_req: Request, res: Response, next: NextFunction): void => {
    if (!this.stopping) return next();
    res.setHeader('Connection', 'close');
    res.setHeader('Retry-After', '5');
    res.status(503).json({
      statusCode: 503,
      message: 'The service is restarting. Try again in a moment.',
      error: 'Service Unavailable',
    });
  };
}
