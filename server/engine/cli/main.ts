// Command-line entry of the engine: `npm run -s engine -- equilibria --couplings J.npy
// --starts X0.npy --mu 1 [--input I.npy] [--rtol 1e-6 --atol 1e-9 --tmax 200] --out result.json`.
// Mistakes in flags or files print one line on stderr and exit with code 2.
import { CliError } from "./args";
import { equilibriaCommand } from "./equilibria-command";

const USAGE =
  "usage: engine equilibria --couplings J.npy --starts X0.npy --mu 1 [--input I.npy] [--rtol 1e-6] [--atol 1e-9] [--tmax 200] --out result.json";

function main(argv: string[]): number {
  const [command, ...rest] = argv;
  try {
    if (command === "equilibria") {
      equilibriaCommand(rest);
      return 0;
    }
    throw new CliError(command === undefined ? USAGE : `unknown command ${JSON.stringify(command)}; ${USAGE}`);
  } catch (e) {
    if (e instanceof CliError || e instanceof RangeError || e instanceof TypeError) {
      process.stderr.write(`engine: ${e.message.split("\n")[0]}\n`);
      return 2;
    }
    throw e;
  }
}

process.exitCode = main(process.argv.slice(2));
