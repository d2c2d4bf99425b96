import { describe, expect, it } from "vitest";
import { CellError } from "../../src/runner/host";
import { contractProblem } from "../support/contract";

// The checker the property suite relies on must itself catch each kind of breach.
describe("the cell-contract checker", () => {
  const params = ["body", "radius"];
  it("accepts finite numbers, text, booleans and well-formed errors", () => {
    expect(contractProblem(params, [[1, "Sun", true, new CellError("#VALUE!", "radius: got -1; expected ..."), new CellError("#NUM!")]])).toBeUndefined();
  });
  it.each([
    ["NaN", [[NaN]]],
    ["Infinity", [[Infinity]]],
    ["an error-looking string", [["#VALUE!"]]],
    ["a ragged result", [[1, 2], [3]]],
    ["an empty result", []],
    ["a message naming no parameter", [[new CellError("#VALUE!", "something went wrong")]]],
    ["an unexpected code", [[new CellError("#DIV/0!", "radius: x")]]],
    ["a #NUM! with a message", [[new CellError("#NUM!", "radius: overflow")]]],
    ["an object", [[{}]]],
  ])("rejects %s", (_, out) => {
    expect(contractProblem(params, out)).toBeTypeOf("string");
  });
});
