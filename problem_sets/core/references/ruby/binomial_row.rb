# C(n, k) = C(n, k - 1) * (n - k + 1) / k, and the division is always exact.
row = [1]
(1..n).each { |k| row << row.last * (n - k + 1) / k }
row
end
