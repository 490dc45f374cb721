import { calculatorRoute } from "@/lib/http/calculator-route";

export const runtime = "nodejs";

export const GET = calculatorRoute("/api/keys/woodruff/match");
