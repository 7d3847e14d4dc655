import compression from 'compression';
import type { Request, RequestHandler, Response } from 'express';

/** Answers that carry a sign-in token. */
const TOKEN_ISSUING_PATHS = ['/api/auth/', '/api/invites/'];

/**
 * gzip or brotli for whatever the client accepts: the built scripts and styles (410 KB of raw
 * JavaScript on the quote page, about a third of that compressed, which Lighthouse counted as the
 * largest saving on a phone's connection) and the larger JSON answers. Sign-in and invitation answers
 * stay as they are: they carry tokens, and a compressed secret beside text an attacker can vary leaks through
 * its length (BREACH). Nothing else the API sends carries a secret.
 */
export function shouldCompress(request: Request, response: Response): boolean {
  if (TOKEN_ISSUING_PATHS.some((prefix) => request.path.startsWith(prefix))) return false;
  return compression.filter(request, response);
}

/** The compression middleware every answer passes through (configureApp). */
export function compressAnswers(): RequestHandler {
  return compression({ filter: shouldCompress });
}
