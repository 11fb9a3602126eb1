// GET /api/health – readiness probe: the database is open and migrated (public, says nothing about any shop)
import { NextResponse } from 'next/server';
import { sql } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { isHttps, securityHeaders } from '@/lib/security-headers';

export const dynamic = 'force-dynamic';

export async function GET(req: Request) {
  const headers = securityHeaders(isHttps(req));
  try {
    const db = await getDb();
    await db.execute(sql`select 1`);
    return NextResponse.json({ ok: true }, { headers });
  } catch {
    return NextResponse.json({ ok: false }, { status: 503, headers });
  }
}
