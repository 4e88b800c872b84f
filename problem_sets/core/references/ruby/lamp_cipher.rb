lower = ("a".."z").to_a.rotate(shift % 26).join
text.tr("a-zA-Z", lower + lower.upcase)
end
