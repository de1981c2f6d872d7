/**
 * Runs one `zeitlight` command line in this process and reports the process's peak resident
 * memory (all threads, including cohort workers) on stderr as `peak-rss-mb <n>` after it ends.
 *   node dist/tests/fuzz/peak-memory-run.js <command> [args…]
 */
import { runCli } from '../../cli/main.js';

const code = await runCli(process.argv.slice(2), { stdout: () => undefined, stderr: (t) => process.stderr.write(t) });
process.stderr.write(`\npeak-rss-mb ${Math.round(process.resourceUsage().maxRSS / 1024)}\n`);
process.exitCode = code;
