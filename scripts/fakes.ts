import path from "node:path";
import { fileURLToPath } from "node:url";
import { startFakeS3 } from "./fake-s3";
import { startFakeSmtp, type RunningService } from "./fake-smtp";

/**
 * `npm run fakes`: the fake SMTP (+ its HTTP listing) and the fake S3 in one process, on loopback.
 *   PP_SMTP_PORT (2525)  PP_MAIL_API_PORT (8025)  PP_MAIL_DIR (.data/mail)
 *   PP_S3_PORT (4569)    PP_S3_DIR (.data/s3)     S3_BUCKET (panelpoint)
 * Relative folders are relative to the project root, whatever the cwd.
 */
const HOST = "127.0.0.1";
const root = fileURLToPath(new URL("..", import.meta.url));

function port(name: string, fallback: number): number {
  const raw = process.env[name];
  const value = raw ? Number(raw) : fallback;
  if (!Number.isInteger(value) || value <= 0 || value > 65535) throw new Error(`${name} must be a TCP port, not "${raw}"`);
  return value;
}

function folder(name: string, fallback: string): string {
  return path.resolve(root, process.env[name] || fallback);
}

function shown(dir: string): string {
  return path.relative(root, dir) || ".";
}

async function main(): Promise<void> {
  const smtpPort = port("PP_SMTP_PORT", 2525);
  const apiPort = port("PP_MAIL_API_PORT", 8025);
  const s3Port = port("PP_S3_PORT", 4569);
  const mailDir = folder("PP_MAIL_DIR", ".data/mail");
  const s3Dir = folder("PP_S3_DIR", ".data/s3");
  const bucket = process.env.S3_BUCKET || "panelpoint";

  const running: RunningService[] = [];
  const stop = async (): Promise<void> => {
    await Promise.all(running.splice(0).map((s) => s.close()));
  };

  try {
    running.push(await startFakeSmtp({ host: HOST, smtpPort, apiPort, directory: mailDir }));
    console.log(`fake SMTP on ${HOST}:${smtpPort}, messages at http://${HOST}:${apiPort}/messages (kept in ${shown(mailDir)})`);
    running.push(await startFakeS3({ host: HOST, port: s3Port, directory: s3Dir, bucket }));
    console.log(`fake S3 on http://${HOST}:${s3Port}, bucket ${bucket} (kept in ${shown(s3Dir)})`);
  } catch (error: unknown) {
    await stop();
    throw error;
  }

  let stopping = false;
  const shutdown = (signal: NodeJS.Signals): void => {
    if (stopping) return;
    stopping = true;
    // Keep-alive sockets could hold close() open forever: give it a moment, then leave anyway.
    const timer = setTimeout(() => process.exit(0), 3000);
    timer.unref();
    stop().then(
      () => {
        console.log(`fakes stopped (${signal})`);
        process.exit(0);
      },
      (error: unknown) => {
        console.error(`fakes: error while stopping: ${String(error)}`);
        process.exit(1);
      },
    );
  };
  process.on("SIGINT", shutdown);
  process.on("SIGTERM", shutdown);
}

main().catch((error: unknown) => {
  console.error(`fakes: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
