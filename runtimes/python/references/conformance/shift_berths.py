return {berth + offset: vessel for berth, vessel in owners.items()}
