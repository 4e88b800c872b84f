    var blanks = new[] { ' ', '\t' };
    var totals = new Dictionary<string, long>();
    foreach (string line in text.Split('\n'))
    {
        if (line.Trim(blanks).Length == 0)
        {
            continue;
        }
        int colon = line.IndexOf(':');
        string name = line.Substring(0, colon).Trim(blanks);
        // An optional sign and ASCII digits, whatever the current culture.
        long quantity = long.Parse(
            line.Substring(colon + 1).Trim(blanks),
            System.Globalization.NumberStyles.AllowLeadingSign,
            System.Globalization.CultureInfo.InvariantCulture);
        totals.TryGetValue(name, out var total);
        totals[name] = total + quantity;
    }
    return totals;
}
