import { NextResponse, type NextRequest } from "next/server";
import { getToken } from "next-auth/jwt";

/** Pages anyone may open; everything else under the app needs a session. */
const PUBLIC_PAGES = ["/sign-in", "/invite", "/reset-password"];

/**
 * Content-Security-Policy: every kind of resource from this server only. Next's inline scripts
 * carry a per-request nonce (read by Next from the request's CSP header); development adds
 * 'unsafe-eval' and inline styles for the framework's hot reload and error overlay.
 */
function contentSecurityPolicy(nonce: string): string {
  const dev = process.env.NODE_ENV !== "production";
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    `style-src 'self'${dev ? " 'unsafe-inline'" : ""}`,
    "img-src 'self'",
    "font-src 'self'",
    "worker-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

export async function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const isApi = pathname.startsWith("/api/");
  const isPublicPage = PUBLIC_PAGES.some((page) => pathname === page || pathname.startsWith(`${page}/`));

  if (!isApi && !isPublicPage) {
    const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET });
    if (!token) {
      const signIn = new URL("/sign-in", request.url);
      signIn.searchParams.set("next", `${pathname}${search}`);
      return NextResponse.redirect(signIn);
    }
  }

  const nonce = btoa(crypto.randomUUID());
  const csp = contentSecurityPolicy(nonce);
  const headers = new Headers(request.headers);
  headers.set("x-nonce", nonce);
  headers.set("content-security-policy", csp);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", csp);
  response.headers.set("x-content-type-options", "nosniff");
  response.headers.set("referrer-policy", "same-origin");
  return response;
}

export const config = {
  // Static assets (tiles, fonts, the map worker, Next's bundles) skip the session check.
  matcher: ["/((?!_next/static|_next/image|tiles/|map-fonts/|maplibre-gl-worker|icon.svg|favicon.ico).*)"],
};
