/** `npm run --silent antenna:evaluate < request.json`: the contract's evaluate call on the command line. */
import { evaluate } from "../src/lib/antenna/evaluate";
import { runJsonCli } from "./lib/json-cli";

void runJsonCli(evaluate);
