import { NextResponse, type NextRequest } from "next/server";
import { SESSION_COOKIE, SESSION_COOKIE_ATTRIBUTES, SESSION_DAYS } from "@/lib/auth/cookie";
import { env, isNextDev } from "@/lib/env";
import { contentSecurityPolicy, photoStoreOrigin } from "@/lib/http/csp";
import { isOwnOrigin, MAX_BODY_BYTES } from "@/lib/http/origin";
import { WROTE_COOKIE, WROTE_COOKIE_ATTRIBUTES } from "@/lib/http/read-own-writes";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

function isDecodablePath(pathname: string): boolean {
  try {
    for (const segment of pathname.split("/")) {
      if (decodeURIComponent(segment).includes("\u0000")) return false;
    }
    return true;
  } catch {
    return false;
  }
}

// Only cheap work here: the CSRF origin check and the session cookie's sliding expiry.
// Who may do what is checked by each page, handler and action itself.
export function proxy(request: NextRequest) {
  // A path with a broken % escape (/api/parts/%FF) cannot be decoded into route parameters; the framework would
  // answer 500, so it is refused here with the reason.
  if (!isDecodablePath(request.nextUrl.pathname)) {
    return NextResponse.json(
      { error: "validation_failed", message: "The address has a broken % escape.", field: "path" },
      { status: 400 },
    );
  }
  if (!SAFE_METHODS.has(request.method)) {
    // Only the import upload takes a large body, and it does not pass through here (see config.matcher).
    if (Number(request.headers.get("content-length") ?? 0) > MAX_BODY_BYTES) {
      return NextResponse.json(
        {
          error: "validation_failed",
          message: `The request body is larger than ${MAX_BODY_BYTES / 1024} KB.`,
          field: "body",
        },
        { status: 413 },
      );
    }
    if (!isOwnOrigin(request.headers, request.nextUrl, env.APP_URL)) {
      return NextResponse.json(
        {
          error: "forbidden_origin",
          message: "This request did not come from an Understudy page. Send an Origin header matching this site.",
        },
        { status: 403 },
      );
    }
    const response = NextResponse.next();
    // With read replicas, this browser reads from the primary for the next few seconds: it sees its own change.
    if (env.DATABASE_READ_URLS.length > 0) response.cookies.set(WROTE_COOKIE, "1", WROTE_COOKIE_ATTRIBUTES);
    return response;
  }

  // A fresh nonce for every page: Next reads it from the request's policy and puts it on its own scripts.
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const policy = contentSecurityPolicy(nonce, {
    development: isNextDev,
    photoStore: photoStoreOrigin(env.S3_ENDPOINT),
  });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("Content-Security-Policy", policy);
  const sessionId = request.cookies.get(SESSION_COOKIE)?.value;
  if (request.method === "GET" && sessionId) {
    response.cookies.set(SESSION_COOKIE, sessionId, {
      ...SESSION_COOKIE_ATTRIBUTES,
      maxAge: 60 * 60 * 24 * SESSION_DAYS,
    });
  }
  return response;
}

// Left out, so that the proxy runs only where it has work:
// - the import upload (POST /api/imports, up to 50 MB), so that Next buffers no large body for the proxy; that route
//   makes the same origin check itself before it reads anything;
// - the anonymous, read-only answers of the catalogue and the calculators (GET only, no parameters in the path, no
//   page to carry a nonce, nothing personal): the busiest addresses, which a CDN keeps (lib/http/cache.ts);
// - the framework's files, the icon and the service worker.
// Next reads the matcher when it builds, so it is one constant; the read-only answers are listed again in
// next.config.mjs (READ_ONLY_ANSWERS), which gives them their own policy, and tests/api/headers.test.ts checks both.
export const config = {
  matcher: [
    // eslint-disable-next-line max-len
    "/((?!_next/static|_next/image|favicon.ico|icon.svg|serwist/|api/imports$|api/(?:parts/lookup|standard-parts|bearings/(?:decode|match)|seals/(?:match|press-fit)|belts/(?:decode|identify|drive)|felts/size|packing/size|plugs/match|keys/(?:woodruff|woodruff/match|parallel)|pins/(?:taper|taper/match)|threads/(?:identify|grease-fittings)|chain/(?:decode|identify|links))$).*)",
  ],
};
