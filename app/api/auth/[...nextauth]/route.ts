// GET/POST /api/auth/*: next-auth's own endpoints; credential sign-ins pass the rate limits of lib/auth/sign-in-guard.ts first
import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { authOptions } from '@/lib/auth/options';
import { guardCredentialSignIn } from '@/lib/auth/sign-in-guard';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

type Ctx = { params: Promise<{ nextauth: string[] }> };

function handle(req: NextRequest, ctx: Ctx) {
  return NextAuth(req, ctx, authOptions());
}

export async function GET(req: NextRequest, ctx: Ctx) {
  return handle(req, ctx);
}

export async function POST(req: NextRequest, ctx: Ctx) {
  return guardCredentialSignIn(req, () => handle(req, ctx));
}

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });
