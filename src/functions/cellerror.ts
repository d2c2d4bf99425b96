import type { DomainError } from "../core/domain";

/**
 * Core domain error → Excel cell error (DEVELOPERS.md, "Conventions"). Excel shows a custom message only with
 * #VALUE! and #N/A, so an arithmetic failure becomes a bare #NUM!.
 */
export function toCellError(e: DomainError): CustomFunctions.Error {
  switch (e.kind) {
    case "bad_argument":
      return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidValue, e.message);
    case "no_answer":
      return new CustomFunctions.Error(CustomFunctions.ErrorCode.notAvailable, e.message);
    default:
      return new CustomFunctions.Error(CustomFunctions.ErrorCode.invalidNumber);
  }
}
