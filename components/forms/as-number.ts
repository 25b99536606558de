/** An <input> value for react-hook-form: empty is "not given", anything else a number (NaN is refused by the schema). */
export const asNumber = (value: unknown) => (value === "" || value === null || value === undefined ? undefined : Number(String(value).replace(",", ".")));
