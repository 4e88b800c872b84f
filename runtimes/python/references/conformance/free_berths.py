return {berth for berth in range(1, count + 1) if berth not in taken}
