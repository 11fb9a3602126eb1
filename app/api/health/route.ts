// GET /api/health – readiness probe: the database is open and migrated (public, says nothing about any shop)
import { NextResponse } from 'next/server';
import { getDb } from '@/db/client';
import { databaseAnswers } from '@/db/queries/health';
import { isHttps, securityHeaders } from '@/lib/security-headers';

export const dynamic = 'force-dynamic';

export async function GET(req: Request) {
  const headers = securityHeaders(isHttps(req));
  try {
    await databaseAnswers(await getDb());
    return NextResponse.json({ ok: true }, { headers });
  } catch {
    return NextResponse.json({ ok: false }, { status: 503, headers });
  }
}
