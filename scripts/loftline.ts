/**
 * The engine's command line: `npm run --silent loftline -- <command> FILE` (FILE may be "-" for
 * standard input). JSON to stdout; bad input gets a message naming the field on stderr and exit
 * code 2.
 */
import { runCommand } from "./cli/io";
import { commands } from "./cli/registry";

function usage(): string {
  const lines = Object.values(commands).map((c) => `  ${c.summary}`);
  return `usage: loftline <command> FILE   (FILE may be - for standard input)\ncommands:\n${lines.join("\n")}\n`;
}

const [name, file] = process.argv.slice(2);
const command = name ? commands[name] : undefined;
if (!command || !Object.prototype.hasOwnProperty.call(commands, name)) {
  process.stderr.write(
    name ? `loftline: bad input: command: unknown command "${name}"\n${usage()}` : usage(),
  );
  process.exitCode = 2;
} else {
  process.exitCode = runCommand(command, file);
}
