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

/** The hosts a page of ours is served from: the one the request was addressed to, and the configured APP_URL's. */
function ownHosts(request: NextRequest): string[] {
  const hosts = [request.headers.get("host")];
  try {
    hosts.push(new URL(process.env.APP_URL ?? "").host);
  } catch {
    // APP_URL unset or malformed: the Host header alone decides.
  }
  return hosts.filter((host): host is string => Boolean(host));
}

function isOwnOrigin(source: string, request: NextRequest): boolean {
  try {
    return ownHosts(request).includes(new URL(source).host);
  } catch {
    return false;
  }
}

// Only cheap work here: the CSRF origin check and the session cookie's sliding expiry.
// Who may do what is checked by each page, handler and action itself.
export function proxy(request: NextRequest) {
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
