if (grid.length === 0) return [];
return grid[0].map((_, column) => grid.map((row) => row[column]));
}
