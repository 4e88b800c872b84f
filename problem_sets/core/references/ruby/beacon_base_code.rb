# Integer#to_s writes lowercase digits and a leading "-" for negative values.
n.to_s(base)
end
