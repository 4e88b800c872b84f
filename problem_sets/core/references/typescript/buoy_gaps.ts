return positions.slice(1).map((position, i) => position - positions[i]);
}
