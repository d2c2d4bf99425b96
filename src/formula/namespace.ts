/**
 * The add-in's function namespace, in one place: what a user types before a function id, and
 * how Excel stores that name in a saved file.
 *
 * Typed form: `ORBIT.ORBITAL_SPEED(...)` (the namespace the manifest declares, a dot, the id).
 * Stored form: `_xldudf_ORBIT_ORBITAL_SPEED(...)`. Excel saves a formula that calls an Office.js
 * custom function under the prefix `_xldudf_` with the namespace's dot turned into an underscore,
 * and only a formula in that form is bound to the add-in when the file is opened again. Sources:
 * Microsoft's custom-functions team in OfficeDev/Excel-Custom-Functions issue #108 ("for
 * JavaScript custom functions we by default save out with a different prefix _xldudf"); the sheet
 * XML quoted in evelyn-chrono/officejs-custom-functions-name-error-repro (README, `<f t="array"
 * ref="A1">_xldudf_CONTOSO_ADD(1,2)</f>` for `=CONTOSO.ADD(1,2)`), filed as OfficeDev/office-js
 * issue #6611.
 */
export const NAMESPACE = "ORBIT";

/** `ORBIT.<ID>`, as typed in a cell. */
export const typedName = (id: string): string => `${NAMESPACE}.${id}`;

/** `_xldudf_ORBIT_<ID>`, as Excel stores it in a saved workbook. */
export const storedName = (id: string): string => `_xldudf_${NAMESPACE}_${id}`;
