# The two largest distinct values, largest first; nil when there is only one.
values.uniq.max(2)[1]
end
