/** `npm run --silent antenna:plan < plan.json`: the contract's plan call on the command line. */
import { plan } from "../src/lib/antenna/plan";
import { runJsonCli } from "./lib/json-cli";

void runJsonCli(plan);
