let width = grid.first().map_or(0, |row| row.len());
(0..width).map(|column| grid.iter().map(|row| row[column]).collect()).collect()
}
