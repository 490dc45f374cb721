import { NextResponse, type NextRequest } from "next/server";
import { SESSION_COOKIE } from "@/lib/auth/cookie";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** The origin a mutating request claims to come from, from Origin or else Referer. */
function requestSource(request: NextRequest): string | null {
  const origin = request.headers.get("origin");
  if (origin && origin !== "null") return origin;
  const referer = request.headers.get("referer");
  if (!referer) return null;
  try {
    return new URL(referer).origin;
  } catch {
    return null;
  }
}

/**
 * The origins a page of ours is served from, scheme included: the one the request was addressed to, and the
 * configured APP_URL's. An http page on the same host is another origin, as browsers count it.
 */
function ownOrigins(request: NextRequest): string[] {
  const origins: string[] = [];
  const host = request.headers.get("host");
  if (host) origins.push(`${request.nextUrl.protocol}//${host}`);
  try {
    origins.push(new URL(process.env.APP_URL ?? "").origin);
  } catch {
    // APP_URL unset or malformed: the request's own address alone decides.
  }
  return origins;
}

function isOwnOrigin(source: string, request: NextRequest): boolean {
  try {
    return ownOrigins(request).includes(new URL(source).origin);
  } catch {
    return false;
  }
}

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
    const source = requestSource(request);
    if (!source || !isOwnOrigin(source, request)) {
      return NextResponse.json(
        {
          error: "forbidden_origin",
          message: "This request did not come from an Understudy page. Send an Origin header matching this site.",
        },
        { status: 403 },
      );
    }
    return NextResponse.next();
  }

  const response = NextResponse.next();
  const sessionId = request.cookies.get(SESSION_COOKIE)?.value;
  if (request.method === "GET" && sessionId) {
    response.cookies.set(SESSION_COOKIE, sessionId, {
      path: "/",
      maxAge: 60 * 60 * 24 * 30,
      sameSite: "lax",
      httpOnly: true,
      secure: process.env.APP_ENV === "production",
    });
  }
  return response;
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.ico|icon.svg).*)"],
};
