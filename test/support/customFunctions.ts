import { CellError, ERROR_CODES } from "../../src/runner/host";

/** Installs the stand-in CustomFunctions global for tests that call the adaptor from source. */
(globalThis as any).CustomFunctions ??= { Error: CellError, ErrorCode: ERROR_CODES, associate: () => undefined };
