// How a stock count shows in the shelf tables: none left is marked, in words as well as colour.
export const stockCell = (row: { stock: number }) => (row.stock === 0 ? "0 (out)" : row.stock);
export const stockClass = (row: { stock: number }) => (row.stock === 0 ? "text-danger" : "");
