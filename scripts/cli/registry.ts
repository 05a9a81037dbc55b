/**
 * The command line's commands by name. A new command is one module exporting a CliCommand and
 * one line here.
 */
import { airplanCommand } from "./airplan";
import { analyseCommand } from "./analyse";
import { attitudeCommand } from "./attitude";
import { flightCommand } from "./flight";
import type { CliCommand } from "./io";

export const commands: Record<string, CliCommand> = {
  flight: flightCommand,
  attitude: attitudeCommand,
  airplan: airplanCommand,
  analyse: analyseCommand(process.argv.slice(4)),
};
