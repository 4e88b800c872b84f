if (readings.length === 0) return 0.0;
return readings.reduce((sum, reading) => sum + reading, 0) / readings.length;
}
