/**
 * The largest id a record can have: ids are PostgreSQL `integer` columns (4 bytes, signed), and a
 * larger number in a query is an error of the database, not a record that is missing.
 */
export const maxRecordId = 2_147_483_647;
