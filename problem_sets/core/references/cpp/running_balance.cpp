std::vector<int64_t> balances;
balances.reserve(deltas.size());
int64_t balance = 0;
for (int64_t delta : deltas) {
    balance += delta;
    balances.push_back(balance);
}
return balances;
}
