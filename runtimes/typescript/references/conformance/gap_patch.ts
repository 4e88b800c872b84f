return readings.map((reading) => (Number.isNaN(reading) ? fill : reading));
}
