// Place for the heat-exchange work: surface properties and results per surface.
// The store is ready for an exchange results slice beside the view-factor one.
export function ExchangeSlot() {
  return (
    <div className="exchange-slot">
      <p><strong>Not available yet.</strong> Surface properties (emissivity, temperature, heat flux or reradiating) and
        net heat per metre will be set and shown here. The sketch file already keeps each surface's properties.</p>
    </div>
  );
}
