    // The invariant culture writes a negative number with an ASCII hyphen-minus.
    string digits = number.ToString(System.Globalization.CultureInfo.InvariantCulture);
    if (string.IsNullOrEmpty(name))
    {
        return "Crate #" + digits;
    }
    return name + " #" + digits;
}
