    double total = 0.0;
    for (int i = 1; i < points.Count; i++)
    {
        double dx = points[i].Item1 - points[i - 1].Item1;
        double dy = points[i].Item2 - points[i - 1].Item2;
        total += Math.Sqrt(dx * dx + dy * dy);
    }
    return total;
}
