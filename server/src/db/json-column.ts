/** A JSON column's value: mysql2 parses MariaDB's JSON columns, and a value that still arrives as text is parsed here. */
export const jsonColumn = (value: unknown): unknown => (typeof value === 'string' ? JSON.parse(value) : value);
