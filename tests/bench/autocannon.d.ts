declare module "autocannon" {
  interface Instance extends PromiseLike<{ requests: { average: number } }> {
    on(
      event: "response",
      listener: (client: unknown, statusCode: number, bytes: number, responseTime: number) => void,
    ): void;
  }
  export default function autocannon(options: Record<string, unknown>): Instance;
}
