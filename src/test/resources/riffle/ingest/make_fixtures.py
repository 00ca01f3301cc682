#!/usr/bin/env python3
"""Writes the input fixtures of the ingest tests (run from this folder: python3 make_fixtures.py).

Every answer, name and address is invented for Second Shot, an online shop selling refurbished
espresso machines and grinders; e-mail addresses use reserved example domains. The files are
committed; this script only documents how their exact bytes (encodings, line endings, byte-order
marks) were made. The .expected files are written by hand or checked by hand.
"""
import random


def write(name, text, encoding="utf-8", newline="\n", bom=b""):
    data = bom + text.replace("\n", newline).encode(encoding)
    with open(name, "wb") as f:
        f.write(data)


Q1 = "What almost stopped you from buying?"
Q2 = "Why did you choose Second Shot over buying new?"

write("utf8-comma-lf.csv", f"""Response ID,Submitted at,Email,{Q1},Q1 codes,{Q2},Q2 codes,Coded by,Device,Customer type,Order value,Country
R-1001,2024-03-02 09:14,ana.lima@example.com,"The shipping cost to Portugal, honestly. It was almost 40 euros.",shipping cost; price,Half the price of a new Brava Duo and still a real warranty,price;warranty,Mira,mobile,new,€200–€500,PT
R-1002,2024-03-02 11:40,j.okafor@example.com,"I wasn't sure ""refurbished"" meant the boiler was checked.
The photos only showed the outside.",trust|condition,The Molino grinder came with new burrs already fitted,condition,Mira,desktop,new,under €200,IE

R-1003,2024-03-03 18:02,lena.h@example.org,n/a,,Cheaper than anything on the local marketplace and I did not have to haggle,price,Tom,desktop,returning,over €500,DE
R-1004,2024-03-04 07:55,pieter@example.net,Nothing,,"Good reviews about your support, and the 12 month warranty",support; warranty,Tom,tablet,returning,€200–€500,NL
R-1005,2024-03-05 21:30,camille.d@example.com,Delivery time of two weeks felt long for a machine already in stock,delivery time,-,,Mira,mobile,new,€200–€500,FR
R-1006,2024-03-06 13:12,sam.r@example.com,"Whether the steam wand would be loud, the video had no sound",noise,I liked that a machine gets a second life instead of going to landfill,sustainability,Tom,mobile,new,under €200,IE
""")

write("utf8-bom-semicolon-crlf.csv", f"""id;date;{Q1};device;plan
1;02.03.2024;Price was 20 € more than I planned, but the tamper was included;desktop;standard warranty
2;03.03.2024;"Not knowing; whether the grinder fits 58 mm portafilters";mobile;extended warranty
3;03.03.2024;The checkout asked me to create an account, I almost left;mobile;standard warranty
4;04.03.2024;no;desktop;standard warranty
5;05.03.2024;Reviews mentioned slow replies from support, that worried me;tablet;extended warranty
""", newline="\r\n", bom=b"\xef\xbb\xbf")

write("windows-1252-semicolon.csv", """respondent;submitted;Why did you choose us?;country
A7;2024-04-01;Le café était moins cher qu’ailleurs, 180 € au lieu de 320 €;FR
A8;2024-04-01;The machine’s pressure gauge was tested and shown in a short video;IE
A9;2024-04-02;Très bon rapport qualité-prix pour un moulin révisé;FR
A10;2024-04-03;Free returns for 30 days, and no questions asked;NL
""", encoding="cp1252", newline="\r\n")

TSV = f"""ID\tTimestamp\t{Q1}\tCustomer type
101\t3/2/2024 9:14\tWorried the descaling history of the machine was unknown\tnew
102\t3/2/2024 10:02\t"Two things:
the grinder’s burrs, and whether the ""as new"" label was honest"\treturning
103\t3/3/2024 16:45\tThe price jumped when I added the milk jug and the tamper\tnew
104\t3/4/2024 8:30\tidk\tnew
"""
write("utf16le-bom-tab.tsv", TSV, encoding="utf-16-le", newline="\r\n", bom=b"\xff\xfe")
write("utf16le-nobom-tab.tsv", TSV, encoding="utf-16-le", newline="\r\n")

write("utf16be-bom-comma.csv", f"""id,{Q2},device
B1,"Local repair shop recommended you, they service these machines",desktop
B2,The thirty day trial meant I could send it back if it was noisy,mobile
B3,"Cheaper, greener, and the grinder looked spotless in the photos",mobile
""", encoding="utf-16-be", bom=b"\xfe\xff")

write("pipe-cr.csv", f"""id|when|{Q1}|country
P1|2024-07-01|The cart page did not show the delivery date until the very end|DE
P2|2024-07-02|"I was torn between two machines.
In the end the comparison table helped."|NL
P3|2024-07-02|Nothing at all, it was an easy choice for me|DE
""", newline="\r")

write("paste-tab.txt", f"""id\t{Q1}\tdevice
K1\tI could not find out whether the portafilter was included\tdesktop
K2\t"Honestly the ""refurbished"" word scared me a bit.
A friend told me it is fine."\tmobile
K3\t.\tmobile
K4\tThe reviews were mostly about espresso machines, not the grinders\tdesktop
""", newline="\r\n")

write("excel-sep-line.csv", f"""sep=;
id;{Q1};segment
E1;The voltage of the machine was not clear for an Irish socket;new
E2;Worried about descaling, since the machine had an unknown history;returning
E3;None;new
""", newline="\r\n")

write("ragged-rows.csv", f"""id,date,{Q1},device
S-1,2024-05-01,The price of the Molino 58 compared to a new one was not that different,desktop
S-2,2024-05-01,Shipping took ten days which is long,mobile,,
S-3,2024-05-02,I was not sure about the warranty
and who would repair it,mobile

S-4,2024-05-03,Photos were great but there was no video of the machine running,tablet,extra
S-5,2024-05-03,Nothing really,desktop
S-6,2024-05-04,Could not find the dimensions of the drip tray anywhere on the page,mobile
S-7,2024-05-04,Whether the seller was a real company with an address,desktop


""")

rows = []
for i in range(1, 17):
    if i % 4 == 0:
        rows.append(f"T-{i},2024-05-{i:02d},The tamper size,\n58 mm or 53 mm,desktop")
    else:
        rows.append(f"T-{i},2024-05-{i:02d},Answer number {i} about the grinder and its burrs,mobile")
write("too-many-problems.csv", f"id,date,{Q1},device\n" + "\n".join(rows) + "\n")

write("duplicate-headers.csv", f""" id ,Comment,,comment,Device,,
D1,The drip tray was scratched in the photos and I almost did not buy,yes,Arrived two days early which was a nice surprise,mobile,,
D2,I compared three shops and yours had the clearest warranty terms,no,The box was huge and hard to carry upstairs,desktop,,
D3,Was not sure the machine would fit under my kitchen cabinets,yes,Packed very well with lots of paper padding,mobile,,
""")

write("named-columns.csv", f"""Order number,Date,Comments,Anything else?,Tags,Device,Country
5521,2024-08-01,The grinder settings were not explained anywhere on the page,Keep the handwritten notes in the box,settings,mobile,PT
5522,2024-08-01,Worried that a lever machine is hard for a beginner,Maybe offer a short video course for beginners,beginner|skills,desktop,ES
5523,2024-08-02,No PayPal at checkout so I had to find my card,no,payment,mobile,PT
""")

write("unclosed-quote.csv", f"""id,date,{Q1},device
U-1,2024-06-01,"Fine, once I saw the warranty",desktop
U-2,2024-06-01,"The delivery window
was vague",mobile
U-3,2024-06-02,"I could not tell if the grinder was 110 or 230 volts,mobile
U-4,2024-06-03,Nothing,desktop
""")

write("semicolon-with-commas.csv", f"""id;date;{Q1}
W1;2024-09-01;Price, mostly, and the shipping fee
W2;2024-09-01;The manual was missing, but support sent a PDF
W3;2024-09-02;Whether it comes with a warranty, and for how long
W4;2024-09-02;Nothing stopped me
""")

write("no-text-column.csv", """id,date,device,country
N1,2024-09-01,mobile,PT
N2,2024-09-01,desktop,IE
N3,2024-09-02,mobile,DE
""")

write("header-only.csv", f"id,date,{Q1},device\n\n", newline="\r\n")
write("empty.csv", "")
write("blank.csv", "  \n\t\n", bom=b"\xef\xbb\xbf")
write("over-limit.csv", f"""id,{Q1}
O1,The price was fine but the shipping estimate changed twice during checkout
O2,I had to ask twice before I got an answer about the boiler material
O3,The photos of the grinder burrs were blurry so I could not judge their state
""")

rnd = random.Random(20240301)
with open("binary.xlsx", "wb") as f:
    f.write(b"PK\x03\x04" + bytes(rnd.randrange(256) for _ in range(600)))
with open("binary-controls.dat", "wb") as f:
    f.write(bytes(rnd.choice([1, 2, 3, 7, 8, 14, 27, 31, 65, 66, 44, 10]) for _ in range(800)))

# Two exports concatenated: the UTF-8 one (English, a few accents) and a windows-1252 one
# (French, many accents), so that stray bytes outnumber UTF-8 sequences; CRLF line ends.
mixed_utf8 = f"""id,{Q1},country
M1,The café in the photos looked nothing like my kitchen,IE
M2,Whether the 58 mm tamper fits – the page did not say,IE
M3,Shipping to Köln took nine days,DE
"""
mixed_1252 = """M4,Le délai de livraison était trop long pour une machine déjà révisée,FR
M5,Très bon rapport qualité-prix mais la crème était décevante,FR
"""
mixed_tail = """M6,Delivery was quick and the grinder arrived well packed,NL
"""
with open("mixed-utf8-windows-1252.csv", "wb") as f:
    f.write(mixed_utf8.replace("\n", "\r\n").encode("utf-8"))
    f.write(mixed_1252.replace("\n", "\r\n").encode("cp1252"))
    f.write(mixed_tail.replace("\n", "\r\n").encode("utf-8"))

# UTF-8 text that was decoded as windows-1252 somewhere before this export (double-encoded).
write("double-encoded.csv", f"""id,{Q1}
D1,"CafÃ© crÃ¨me was what I wanted, and the machine makes it"
D2,The grinder was fine and arrived on time
D3,The manual said 9Â bar but the gauge showed 12 â€“ which is right?
""")
