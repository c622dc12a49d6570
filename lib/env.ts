// The environment, validated once. Import `env` instead of reading process.env.
import { z } from "zod";

const schema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().url().default("postgres://postgres@127.0.0.1:5544/farfield"),
  APP_BASE_URL: z.string().url().default("http://127.0.0.1:3000"),
  DATABASE_POOL_SIZE: z.coerce.number().int().min(1).max(100).default(10),
  SMTP_HOST: z.string().default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().default(2525),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  SMTP_FROM: z.string().default("Farfield <no-reply@farfield.example>"),
  /** Where the local fake SMTP server keeps the messages it receives (scripts/fake-smtp.ts). */
  MAIL_DIR: z.string().default(".data/mail"),
  /** "true" when npm start or npm test run the fake SMTP server: the demo's directors may read its messages. */
  DEV_MAILBOX: z.enum(["true", "false"]).optional(),
  /**
   * How many proxies (load balancers) stand in front of the app and append to X-Forwarded-For and
   * X-Forwarded-Host. 0 (the default): those headers are the client's own words and are ignored.
   */
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(10).default(0),
  /** Set by server.ts, which writes each connection's address into a header of its own. */
  FARFIELD_PEER_HEADER: z.enum(["true"]).optional(),
  /** Cookies are Secure unless the app is served on plain http (local use). */
  COOKIE_SECURE: z.enum(["true", "false"]).optional(),
});

export const env = schema.parse(process.env);
export const cookieSecure = env.COOKIE_SECURE ? env.COOKIE_SECURE === "true" : env.APP_BASE_URL.startsWith("https:");
