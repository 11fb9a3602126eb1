import 'server-only';
import { notFound } from 'next/navigation';
import { DomainError } from '@/lib/errors';

/**
 * A page's read of one thing: what the query found, or the app's 404 page when it says there is no such thing in
 * this shop (queries throw `notFound` rather than answer null; any other error goes to the error page as before).
 */
export async function found<T>(read: Promise<T>): Promise<T> {
  try {
    return await read;
  } catch (error) {
    if (error instanceof DomainError && error.kind === 'not-found') notFound();
    throw error;
  }
}
